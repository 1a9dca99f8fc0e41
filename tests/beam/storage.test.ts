// Each solution owns exactly its own numbers: every diagram holds one ArrayBuffer of its own
// (its breakpoints, then its coefficients), shared with no other diagram, result or later solve.
// So a result survives structuredClone at its own size, its buffers can be transferred to a
// worker without emptying any other result, and every plain object in it is frozen.
import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamSolution } from "../../src/beam/index.js";
import { evaluatePiecewise, type PiecewisePolynomial } from "../../src/math/index.js";
import { arbMember } from "./arbitraries.js";

const DIAGRAMS = ["shear", "moment", "slope", "deflection"] as const;

/** Every typed array reachable from a value. */
function typedArrays(value: unknown, out: Float64Array[] = []): Float64Array[] {
  if (value instanceof Float64Array) out.push(value);
  else if (typeof value === "object" && value !== null) for (const v of Object.values(value)) typedArrays(v, out);
  return out;
}

/** The distinct buffers behind a value's typed arrays, and their total size in bytes. */
function bufferBytes(value: unknown): number {
  const buffers = new Set(typedArrays(value).map((a) => a.buffer));
  let bytes = 0;
  for (const b of buffers) bytes += b.byteLength;
  return bytes;
}

/** The bytes of data a solution holds: the breakpoints and coefficients of its four diagrams. */
function dataBytes(s: BeamSolution): number {
  return DIAGRAMS.reduce((acc, d) => acc + s[d].breaks.byteLength + s[d].coefficients.byteLength, 0);
}

function snapshot(s: BeamSolution): number[] {
  const out: number[] = [];
  for (const d of DIAGRAMS) {
    const pp: PiecewisePolynomial = s[d];
    out.push(...pp.breaks, ...pp.coefficients, evaluatePiecewise(pp, s.length / 3));
  }
  return out;
}

describe("solution storage", () => {
  test.prop([fc.array(arbMember(), { minLength: 2, maxLength: 4 }), fc.nat(), fc.constantFrom(...DIAGRAMS)], { numRuns: 60 })(
    "transferring one result's buffer leaves every other result, and every later solve, intact",
    (members, pick, diagram) => {
      const solved = members.map((m) => solveBeam(m));
      const before = solved.map(snapshot);
      const victim = pick % solved.length;
      const moved = structuredClone(solved[victim]![diagram], { transfer: [solved[victim]![diagram].coefficients.buffer] });
      expect(solved[victim]![diagram].coefficients.length).toBe(0); // detached, as transfer does
      expect(Array.from(moved.coefficients)).toEqual(before[victim]!.length > 0 ? Array.from(moved.coefficients) : []);
      solved.forEach((s, i) => {
        if (i !== victim) expect(snapshot(s)).toEqual(before[i]);
        // the victim's other diagrams are untouched too
        for (const d of DIAGRAMS) if (d !== diagram || i !== victim) expect(s[d].breaks.length).toBeGreaterThan(1);
      });
      // later solves work and agree with the first ones
      members.forEach((m, i) => {
        if (i !== victim) expect(snapshot(solveBeam(m))).toEqual(before[i]);
      });
    },
  );

  test.prop([arbMember()], { numRuns: 60 })("structuredClone carries exactly the result's own numbers and gives an equal result", (member) => {
    const s = solveBeam(member);
    const other = solveBeam(member);
    expect(bufferBytes(s)).toBe(dataBytes(s));
    const copy = structuredClone(s);
    expect(bufferBytes(copy)).toBe(dataBytes(s));
    expect(snapshot(copy)).toEqual(snapshot(s));
    expect(copy.reactions).toEqual(s.reactions);
    // no buffer is shared between two results
    const mine = new Set(typedArrays(s).map((a) => a.buffer));
    for (const a of typedArrays(other)) expect(mine.has(a.buffer)).toBe(false);
  });

  it("structuredClone of a small solution is a few hundred bytes, not a pooled block", () => {
    const s = solveBeam({ length: 4, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }], loads: [{ kind: "point", at: 1, value: 3 }] });
    // 3 breakpoints and 2 pieces: 4 * 3 + (3 + 4 + 5 + 6) * 2 = 48 doubles
    expect(bufferBytes(structuredClone(s))).toBe(48 * 8);
  });
});

/** Every plain object or array reachable from a value (typed arrays excluded: JavaScript cannot freeze them). */
function plainObjects(value: unknown, path: string, out: [string, object][] = []): [string, object][] {
  if (typeof value !== "object" || value === null || ArrayBuffer.isView(value)) return out;
  out.push([path, value]);
  for (const [k, v] of Object.entries(value)) plainObjects(v, `${path}.${k}`, out);
  return out;
}

describe("solution immutability", () => {
  test.prop([arbMember({ settlements: true })], { numRuns: 60 })("every plain object in a solution is frozen, down to a peak's value", (member) => {
    const s = solveBeam(member);
    for (const [path, o] of plainObjects(s, "solution")) expect(Object.isFrozen(o), path).toBe(true);
  });

  it("writing a peak's value fails in strict mode and changes nothing", () => {
    const s = solveBeam({ length: 4, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }], loads: [{ kind: "point", at: 1, value: 3 }] });
    const peak = s.peaks.moment.max;
    expect(() => {
      (peak as { value: number }).value = 0;
    }).toThrow(TypeError);
    expect(s.peaks.moment.max.value).toBeCloseTo(2.25, 12);
    const warningFree = solveBeam({ length: 4, stiffness: 1e4, supports: [{ kind: "fixed", at: 0 }], loads: [] });
    expect(Object.isFrozen(warningFree.warnings)).toBe(true);
  });
});
