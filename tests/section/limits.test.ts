import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  circle,
  firstMomentAbove,
  iSection,
  plasticProperties,
  rectangle,
  section,
  sectionProperties,
  secondMomentAbout,
  type SectionPart,
} from "../../src/section/index.js";

function codesOf(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => `${i.code} ${i.path.join(".")}`);
    throw e;
  }
  return "no error";
}

const plate = (z0: number, y0: number, w: number, h: number, extra: Partial<SectionPart> = {}): SectionPart =>
  ({ kind: "polygon", points: [{ y: y0, z: z0 }, { y: y0, z: z0 + w }, { y: y0 + h, z: z0 + w }, { y: y0 + h, z: z0 }], ...extra }) as SectionPart;

/** Every number in a plain result, depth first. */
function numbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (typeof value === "object" && value !== null) for (const v of Object.values(value)) numbers(v, out);
  return out;
}

describe("sizes the arithmetic cannot carry are refused, never answered with Infinity or NaN", () => {
  it("dimensions near 1e100 are dimension-out-of-range (they once gave Infinity for I and NaN elsewhere)", () => {
    expect(codesOf(() => rectangle({ width: 1e100, depth: 2e100 }))).toEqual(["dimension-out-of-range width", "dimension-out-of-range depth"]);
    expect(codesOf(() => section([{ kind: "circle", centre: { y: 0, z: 1e100 }, radius: 1 }]))).toEqual(["dimension-out-of-range parts.0.centre.z"]);
    expect(codesOf(() => section([{ kind: "circle", centre: { y: 0, z: 0 }, radius: 1e70 }]))).toEqual(["dimension-out-of-range parts.0.radius"]);
    expect(codesOf(() => section([plate(0, 0, 1e80, 1e80)]))).toEqual(["dimension-out-of-range parts.0.points.1.z", "dimension-out-of-range parts.0.points.2.y", "dimension-out-of-range parts.0.points.2.z", "dimension-out-of-range parts.0.points.3.y"]);
  });

  it("a section smaller than 1e-60 across is section-too-small (its I once underflowed to 0)", () => {
    expect(codesOf(() => rectangle({ width: 1e-100, depth: 2e-100 }))).toEqual(["section-too-small parts"]);
  });

  it("moduli further apart than 1e15, or a reference modulus that far off, are modular-ratio-out-of-range", () => {
    const two = [plate(0, 0, 1, 1, { material: { elasticModulus: 1e-300 } }), plate(0, 1, 1, 1, { material: { elasticModulus: 1e300 } })];
    expect(codesOf(() => section(two))).toEqual(["modular-ratio-out-of-range parts.1.material.elasticModulus"]);
    const ok = section([plate(0, 0, 1, 1, { material: { elasticModulus: 1 } }), plate(0, 1, 1, 1, { material: { elasticModulus: 10 } })]);
    expect(codesOf(() => sectionProperties(ok, { referenceModulus: 1e-300 }))).toEqual(["modular-ratio-out-of-range referenceModulus"]);
  });

  it("a yield strength whose plastic moment overflows is result-out-of-range", () => {
    const s = rectangle({ width: 1e50, depth: 1e50 }, { material: { elasticModulus: 1, yieldStrength: 1e300 } });
    expect(codesOf(() => plasticProperties(s))).toEqual(["result-out-of-range parts.0.material.yieldStrength"]);
  });

  test.prop([fc.double({ min: -55, max: 55, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })], { numRuns: 60 })(
    "at any scale from 1e-55 to 1e55 every property is finite and I_z scales as the fourth power",
    (exponent, offset) => {
      const k = 10 ** exponent;
      const shape = (scale: number) =>
        section([
          ...iSection({ depth: 3 * scale, flangeWidth: 2 * scale, flangeThickness: 0.2 * scale, webThickness: 0.1 * scale, rootRadius: 0.15 * scale }).parts,
          ...circle({ diameter: 0.5 * scale }).parts.map((p) => ({ ...p, hole: true })),
        ].map((p) => (p.kind === "circle" ? { ...p, centre: { y: offset * scale, z: 0 }, radius: (p as { radius: number }).radius * 0.1 } : p)));
      const big = sectionProperties(shape(k));
      const unit = sectionProperties(shape(1));
      for (const v of numbers(big)) expect(Number.isFinite(v)).toBe(true);
      expect(big.secondMomentZ / k ** 4 / unit.secondMomentZ).toBeCloseTo(1, 9);
      for (const v of numbers(firstMomentAbove(shape(k), big.centroid.y))) expect(Number.isFinite(v)).toBe(true);
      for (const v of numbers(secondMomentAbout(shape(k), { y: 1e3 * k, z: -1e3 * k }))) expect(Number.isFinite(v)).toBe(true);
      for (const v of numbers(plasticProperties(shape(k)))) expect(Number.isFinite(v)).toBe(true);
    },
  );
});
