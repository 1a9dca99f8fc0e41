import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section, SectionPart } from "../types.js";

/**
 * One section from any mix of sections and parts, in order: cover plates on a rolled shape, a
 * timber beam with steel flitch plates, a plate with bolt holes. Place the pieces first with
 * {@link translateSection}, {@link rotateSection} or {@link mirrorSection} (or the part forms);
 * solid pieces must touch but not overlap, and holes must lie inside the solids.
 *
 * @param pieces - Sections and parts, joined in the order given.
 * @returns The checked, frozen section.
 * @throws FlexuraError any code of {@link section}, with paths into the joined list of parts.
 * @example
 * ```ts
 * const beam = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 });
 * const cover = translateSection(rectangle({ width: 200, depth: 12 }), { y: 156, z: 0 });
 * const strengthened = builtUp([beam, cover]);
 * ```
 */
export function builtUp(pieces: readonly (Section | SectionPart)[]): Section {
  const parts: SectionPart[] = [];
  const list: readonly unknown[] = Array.isArray(pieces) ? pieces : [];
  for (const piece of list) {
    const inner = typeof piece === "object" && piece !== null ? (piece as { parts?: unknown }).parts : undefined;
    if (Array.isArray(inner)) parts.push(...(inner as SectionPart[]));
    else parts.push(piece as SectionPart);
  }
  return section(parts);
}

/**
 * The non-throwing form of {@link builtUp}.
 *
 * @example
 * ```ts
 * const r = tryBuiltUp([]);
 * if (!r.ok) console.log(r.error.code); // "section-empty"
 * ```
 */
export function tryBuiltUp(pieces: readonly (Section | SectionPart)[]): Result<Section> {
  return attempt(() => builtUp(pieces));
}
