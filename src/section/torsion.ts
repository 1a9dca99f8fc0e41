import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { normalisedPolygon } from "./edges.js";
import { prepareSection } from "./prepare.js";
import type { Section } from "./types.js";

/** Side lengths of a polygon that is a rectangle (any orientation), or undefined. */
function rectangleSides(points: readonly { readonly y: number; readonly z: number }[]): readonly [number, number] | undefined {
  const { zs, ys } = normalisedPolygon(points);
  if (zs.length !== 4) return undefined;
  const side = (i: number): [number, number] => [(zs[(i + 1) % 4] ?? 0) - (zs[i] ?? 0), (ys[(i + 1) % 4] ?? 0) - (ys[i] ?? 0)];
  const a = side(0);
  const b = side(1);
  const c = side(2);
  const la = Math.hypot(a[0], a[1]);
  const lb = Math.hypot(b[0], b[1]);
  const square = (u: [number, number], v: [number, number]): boolean => Math.abs(u[0] * v[0] + u[1] * v[1]) <= 1e-9 * Math.hypot(...u) * Math.hypot(...v);
  const parallelEqual = Math.abs(a[0] + c[0]) <= 1e-9 * la && Math.abs(a[1] + c[1]) <= 1e-9 * la;
  return square(a, b) && parallelEqual ? [la, lb] : undefined;
}

/**
 * Approximate St Venant torsion constant of a thin-walled open section made of rectangular
 * plates: J = sum of b t^3 / 3 over the plates, b the longer side and t the shorter (the
 * common approximation for thin-walled open sections).
 * It is an approximation: it ignores the stiffening of the junctions and root fillets (fillet
 * parts are skipped) and overestimates the stiffness of thick, stocky plates. Not for closed
 * sections (tubes, boxes), whose torsion constant is far larger.
 *
 * @param section - A section of rectangular polygon plates, optionally with fillets, and no holes.
 * @returns J (length^4), approximate.
 * @throws FlexuraError any code of `section()`; `torsion-closed-section` when the section has a
 *   hole; `torsion-part-not-plate` for a part that is neither a rectangle nor a fillet.
 * @example
 * ```ts
 * // two 150 x 10 flanges and a 280 x 6 web: 2 (150 10^3 / 3) + 280 6^3 / 3
 * torsionConstantThinWalled(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 })); // 120160
 * ```
 */
export function torsionConstantThinWalled(section: Section): number {
  prepareSection(section);
  const found = new IssueCollector();
  let j = 0;
  section.parts.forEach((part, i) => {
    if (part.hole === true) {
      found.add("torsion-closed-section", ["parts", i], "The thin-walled open-section formula does not apply to a section with holes (a closed tube or box is far stiffer in torsion).");
      return;
    }
    if (part.kind === "fillet") return;
    const sides = part.kind === "polygon" ? rectangleSides(part.points) : undefined;
    if (!sides) {
      found.add("torsion-part-not-plate", ["parts", i], "Only rectangular plates (and fillets, which are skipped) enter the thin-walled torsion constant; this part is not a rectangle.");
      return;
    }
    const b = Math.max(sides[0], sides[1]);
    const t = Math.min(sides[0], sides[1]);
    j += (b * t ** 3) / 3;
  });
  found.throwIfAny();
  return j;
}

/**
 * The non-throwing form of {@link torsionConstantThinWalled}.
 *
 * @example
 * ```ts
 * const r = tryTorsionConstantThinWalled(pipe({ outsideDiameter: 100, wallThickness: 5 })); // ok: false
 * ```
 */
export function tryTorsionConstantThinWalled(section: Section): Result<number> {
  return attempt(() => torsionConstantThinWalled(section));
}
