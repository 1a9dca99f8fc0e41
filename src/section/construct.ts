import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { checkSection, remember } from "./prepare.js";
import type { Section, SectionPart } from "./types.js";

/** A deep, frozen copy of plain data (parts, points, materials). */
function frozenCopy<T>(value: T): T {
  if (typeof value !== "object" || value === null) return value;
  // arrays element by element (string keys on an array take V8's slow path)
  if (Array.isArray(value)) return Object.freeze(value.map(frozenCopy)) as T;
  // own fields in one step (faster here than a loop of keyed stores, or a spread, which makes freezing slow); then the nested objects
  const copy: Record<string, unknown> = Object.assign({}, value as Record<string, unknown>);
  for (const k in copy) {
    const v = copy[k];
    if (typeof v === "object" && v !== null) copy[k] = frozenCopy(v);
  }
  return Object.freeze(copy) as T;
}

/**
 * Checks a list of parts and returns them as a frozen {@link Section}. Every property function
 * accepts any `{ parts }` object, but a section made here is checked once and remembered, so
 * later calls skip the checks.
 *
 * Rules: polygons simple (either winding) with non-zero area; radii positive; every hole inside
 * the solid parts (checked exactly: hole edges are split where solid boundaries meet them, and
 * no gap between solids may lie inside a hole); solid parts must not
 * overlap each other (checked: parts whose bounding boxes overlap are tested by their exact
 * common area, circular arcs taken as eight chords each; a solid part lying inside a hole may
 * overlap the solid around that hole, since it fills part of the hole back); holes must not
 * overlap each other (checked by their common area, as for solids); either every solid
 * part has a material or none has. A hole without a material
 * takes the material of the solid it lies in.
 *
 * @param parts - The parts, solid and holes, in any order.
 * @returns The checked, frozen section.
 * @throws FlexuraError with every problem found: `section-empty`, `section-no-solid`,
 *   `part-invalid`, `part-kind-unknown`, `point-invalid`, `not-a-number`, `not-finite`,
 *   `dimension-not-positive`, `polygon-degenerate`, `polygon-self-intersecting`,
 *   `sector-sweep-out-of-range`, `material-invalid`, `elastic-modulus-not-positive`,
 *   `yield-strength-not-positive`, `material-missing`, `hole-outside-solid`, `holes-overlap`, `parts-overlap`,
 *   `unknown-field`, `dimension-out-of-range`, `section-too-small`, `modular-ratio-out-of-range`,
 *   `section-area-not-positive`.
 * @example
 * ```ts
 * const plateWithHole = section([
 *   { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 100 }, { y: 10, z: 100 }, { y: 10, z: 0 }] },
 *   { kind: "circle", centre: { y: 5, z: 50 }, radius: 3, hole: true },
 * ]);
 * ```
 */
export function section(parts: readonly SectionPart[]): Section {
  const found = new IssueCollector();
  if (!Array.isArray(parts)) {
    found.add("section-invalid", ["parts"], "The parts must be a list.");
    found.throwIfAny();
  }
  const valid = checkSection({ parts }, found);
  found.throwIfAny();
  const frozen: Section = frozenCopy({ parts });
  // the frozen copy holds the same values, so its compiled form is the one just made
  if (valid) remember({ ...valid, section: frozen });
  return frozen;
}

/**
 * The non-throwing form of {@link section}.
 *
 * @example
 * ```ts
 * const r = trySection([{ kind: "circle", centre: { y: 0, z: 0 }, radius: -1 }]);
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "dimension-not-positive"
 * ```
 */
export function trySection(parts: readonly SectionPart[]): Result<Section> {
  return attempt(() => section(parts));
}
