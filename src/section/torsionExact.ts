// Exact St Venant torsion constants of the solid sections that have one: a solid circle and a
// circular tube (closed form), a solid rectangle (the series solution of the Saint-Venant problem).
import { attempt, fail, type Result } from "../errors/index.js";
import { normalisedPolygon } from "./edges.js";
import { prepareSection } from "./prepare.js";
import type { Section } from "./types.js";

/**
 * An exact torsion constant and the formula it came from.
 *
 * @example
 * ```ts
 * const j: ExactTorsion = torsionConstantExact(rectangle({ width: 100, depth: 20 }));
 * ```
 */
export interface ExactTorsion {
  /** St Venant torsion constant J (length^4). */
  readonly torsionConstant: number;
  /** Which exact solution applied. */
  readonly formula: "solid-circle" | "circular-tube" | "solid-rectangle";
}

/** 31/32 zeta(5): the sum of 1 / n^5 over odd n. */
const ODD_ZETA5 = (31 / 32) * 1.03692775514337;

/**
 * @internal J of a solid rectangle b x t (b >= t): J = (b t^3 / 3) [1 - (192 / pi^5) (t / b) sum over odd n of
 * tanh(n pi b / (2 t)) / n^5] (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., section 109).
 * The sum is taken as sum 1/n^5 less sum (1 - tanh) / n^5, whose terms vanish fast.
 */
export function rectangleTorsionConstant(b: number, t: number): number {
  const long = Math.max(b, t);
  const short = Math.min(b, t);
  let correction = 0;
  for (let n = 1; n < 60; n += 2) {
    const x = (n * Math.PI * long) / (2 * short);
    // 1 - tanh x = 2 / (e^{2x} + 1)
    const term = 2 / (Math.exp(2 * x) + 1) / n ** 5;
    correction += term;
    if (term < 1e-18) break;
  }
  const sum = ODD_ZETA5 - correction;
  return ((long * short ** 3) / 3) * (1 - ((192 / Math.PI ** 5) * (short / long)) * sum);
}

function rectangleSides(points: readonly { readonly y: number; readonly z: number }[]): readonly [number, number] | undefined {
  const { zs, ys } = normalisedPolygon(points);
  if (zs.length !== 4) return undefined;
  const side = (i: number): [number, number] => [zs[(i + 1) % 4]! - zs[i]!, ys[(i + 1) % 4]! - ys[i]!];
  const a = side(0), b = side(1), c = side(2);
  const la = Math.hypot(...a), lb = Math.hypot(...b);
  const square = Math.abs(a[0] * b[0] + a[1] * b[1]) <= 1e-9 * la * lb;
  const parallel = Math.abs(a[0] + c[0]) <= 1e-9 * la && Math.abs(a[1] + c[1]) <= 1e-9 * la;
  return square && parallel ? [la, lb] : undefined;
}

/**
 * The exact St Venant torsion constant J of the sections that have one in closed form or as a
 * converging series: a solid circle, J = pi r^4 / 2; a circular tube (two concentric circles, the
 * inner a hole), J = pi (r_o^4 - r_i^4) / 2 (the polar moment: plane sections stay plane); a solid
 * rectangle in any orientation, by the series of the Saint-Venant solution (Timoshenko and
 * Goodier, Theory of Elasticity, 3rd ed., section 109; Roark's Formulas for Stress and Strain,
 * table of torsion constants, lists its values). J is a property of the geometry alone: the
 * parts' materials are not used.
 *
 * @param section - One circle, one circle with a concentric circular hole, or one rectangle.
 * @returns J and the formula used.
 * @throws FlexuraError any code of `section()`; `torsion-exact-not-available` for any other
 *   section (for thin-walled open sections use {@link torsionConstantThinWalled} or, with
 *   fillets, {@link torsionConstantRolledI} and {@link torsionConstantRolledTee}; for closed thin-walled ones {@link closedSectionTorsion}).
 * @example
 * ```ts
 * torsionConstantExact(rectangle({ width: 50, depth: 50 })).torsionConstant; // 0.1406 b^4 = 878.6e3
 * ```
 */
export function torsionConstantExact(section: Section): ExactTorsion {
  prepareSection(section);
  const parts = section.parts;
  const first = parts[0]!;
  if (parts.length === 1 && first.kind === "circle" && first.hole !== true)
    return Object.freeze({ torsionConstant: (Math.PI * first.radius ** 4) / 2, formula: "solid-circle" });
  if (parts.length === 2) {
    const [a, b] = parts as readonly [(typeof parts)[number], (typeof parts)[number]];
    if (a.kind === "circle" && b.kind === "circle" && (a.hole === true) !== (b.hole === true)) {
      const outer = a.hole === true ? b : a;
      const inner = a.hole === true ? a : b;
      const size = outer.radius;
      if (Math.hypot(outer.centre.y - inner.centre.y, outer.centre.z - inner.centre.z) <= 1e-12 * size)
        return Object.freeze({ torsionConstant: (Math.PI * (outer.radius ** 4 - inner.radius ** 4)) / 2, formula: "circular-tube" });
    }
  }
  if (parts.length === 1 && first.kind === "polygon" && first.hole !== true) {
    const sides = rectangleSides(first.points);
    if (sides) return Object.freeze({ torsionConstant: rectangleTorsionConstant(sides[0], sides[1]), formula: "solid-rectangle" });
  }
  return fail(
    "torsion-exact-not-available",
    ["parts"],
    "An exact torsion constant is available for a solid circle, a circular tube and a solid rectangle only. For a thin-walled open section use torsionConstantThinWalled (or torsionConstantRolledI / torsionConstantRolledTee for a rolled I or tee with fillets); for a closed thin-walled one, closedSectionTorsion.",
  );
}

/**
 * The non-throwing form of {@link torsionConstantExact}.
 *
 * @example
 * ```ts
 * const r = tryTorsionConstantExact(tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 }));
 * if (!r.ok) console.log(r.error.code); // "torsion-exact-not-available"
 * ```
 */
export function tryTorsionConstantExact(section: Section): Result<ExactTorsion> {
  return attempt(() => torsionConstantExact(section));
}
