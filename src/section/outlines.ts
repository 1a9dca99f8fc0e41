import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { ARC, STRIDE } from "./edges.js";
import { prepareSection } from "./prepare.js";
import type { Section, SectionPoint } from "./types.js";

/**
 * The outline of one part, for drawing: a closed polygon (first point not repeated),
 * counterclockwise.
 *
 * @example
 * ```ts
 * const first: PartOutline | undefined = outlines(rectangle({ width: 10, depth: 20 }))[0];
 * ```
 */
export interface PartOutline {
  /** Index of the part in `section.parts`. */
  readonly part: number;
  /** True for a hole (draw it in the background colour, or use an even-odd fill). */
  readonly hole: boolean;
  /** Points `{ y, z }` in absolute coordinates; arcs are drawn as chords. */
  readonly points: readonly SectionPoint[];
}

/**
 * Options of {@link outlines}.
 *
 * @example
 * ```ts
 * const opts: OutlinesOptions = { segmentsPerQuarterTurn: 16 };
 * ```
 */
export interface OutlinesOptions {
  /** Chords per quarter turn of an arc, a whole number from 1 to 1000; default 8. */
  readonly segmentsPerQuarterTurn?: number;
}

/**
 * The outline of every part as a polygon, for drawing. Arcs become chords (the properties
 * themselves always use the exact arcs). Draw the solids, then the holes over them.
 *
 * @param section - The section.
 * @param options - {@link OutlinesOptions}.
 * @throws FlexuraError any code of `section()`; `segments-invalid` for a bad
 *   `segmentsPerQuarterTurn`.
 * @example
 * ```ts
 * for (const o of outlines(pipe({ outsideDiameter: 100, wallThickness: 5 }))) console.log(o.hole, o.points.length);
 * ```
 */
export function outlines(section: Section, options?: OutlinesOptions): readonly PartOutline[] {
  const n = options?.segmentsPerQuarterTurn ?? 8;
  if (!Number.isInteger(n) || n < 1 || n > 1000) {
    const found = new IssueCollector();
    found.add("segments-invalid", ["segmentsPerQuarterTurn"], `segmentsPerQuarterTurn must be a whole number from 1 to 1000; got ${String(n)}.`);
    found.throwIfAny();
  }
  const p = prepareSection(section);
  const out: PartOutline[] = [];
  for (let i = 0; i < p.count; i++) {
    const points: SectionPoint[] = [];
    for (let e = p.edgeStart[i]!; e < p.edgeStart[i + 1]!; e++) {
      const o = e * STRIDE;
      if (p.edges[o] === ARC) {
        const zc = p.edges[o + 1]! + p.refZ;
        const yc = p.edges[o + 2]! + p.refY;
        const r = p.edges[o + 3]!;
        const t0 = p.edges[o + 4]!;
        const t1 = p.edges[o + 5]!;
        const steps = Math.max(1, Math.ceil((Math.abs(t1 - t0) / (Math.PI / 2)) * n - 1e-9));
        for (let k = 0; k < steps; k++) {
          const t = t0 + ((t1 - t0) * k) / steps;
          points.push({ y: yc + r * Math.sin(t), z: zc + r * Math.cos(t) });
        }
      } else {
        points.push({ y: p.edges[o + 2]! + p.refY, z: p.edges[o + 1]! + p.refZ });
      }
    }
    out.push({ part: i, hole: p.sign[i]! < 0, points });
  }
  return out;
}

/**
 * The non-throwing form of {@link outlines}.
 *
 * @example
 * ```ts
 * const r = tryOutlines(rectangle({ width: 10, depth: 20 }), { segmentsPerQuarterTurn: 0 }); // ok: false
 * ```
 */
export function tryOutlines(section: Section, options?: OutlinesOptions): Result<readonly PartOutline[]> {
  return attempt(() => outlines(section, options));
}
