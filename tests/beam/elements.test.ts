// The element model: elements run only between supports, hinges and stiffness steps, and the
// loads inside an element act through its exact fixed-end actions. These checks state what that
// buys: fixed-end actions that match the published ones for every kind of load, results that do
// not depend on where breakpoints fall, full precision with loads a hair from a support, and a
// breakpoint search that agrees with plain bisection.
import { describe, it, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import { nodeIndex } from "../../src/beam/model.js";
import type { Load } from "../../src/loads/index.js";
import { evaluatePiecewise, extremesOf } from "../../src/math/index.js";
import { arbMember, samplePoints } from "./arbitraries.js";
import { near } from "./helpers.js";

const EI = 3.5e4; // kN m^2, invented
const fixedFixed = (length: number, loads: readonly Load[]): BeamInput => ({
  length,
  stiffness: EI,
  supports: [
    { kind: "fixed", at: 0 },
    { kind: "fixed", at: length },
  ],
  loads,
});

describe("fixed-end actions: the reactions of a member fixed at both ends", () => {
  it("a triangular load rising to the right end: 3W/10 and 7W/10, wL^2/30 and wL^2/20", () => {
    // Weaver & Gere, Matrix Analysis of Framed Structures, 3rd ed., appendix B, fixed-end actions
    // for a linearly varying load (from memory); also AISC Steel Construction Manual, 15th ed.,
    // Table 3-23 (fixed ends, load increasing uniformly to one end; case number not recalled).
    const L = 6.4;
    const w = 18;
    const s = solveBeam(fixedFixed(L, [{ kind: "distributed", from: 0, to: L, start: 0, end: w }]));
    near(s.reactions[0]!.force, (3 * w * L) / 20);
    near(s.reactions[1]!.force, (7 * w * L) / 20);
    // reactions counterclockwise positive: the left wall turns the member counterclockwise
    near(s.reactions[0]!.moment, (w * L * L) / 30);
    near(s.reactions[1]!.moment, (-w * L * L) / 20);
  });

  it("a couple inside the span: 6 M a b / L^3 and M b (2a - b) / L^2, M a (2b - a) / L^2", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table 8.1, case 3e (both ends fixed,
    // intermediate couple; case number from memory). Signs here follow flexura's conventions:
    // a counterclockwise couple M0 is resisted by an upward left reaction and a downward right one.
    const L = 5;
    const a = 1.75;
    const b = L - a;
    const M0 = 24;
    const s = solveBeam(fixedFixed(L, [{ kind: "couple", at: a, value: M0 }]));
    near(s.reactions[0]!.force, (6 * M0 * a * b) / L ** 3);
    near(s.reactions[1]!.force, (-6 * M0 * a * b) / L ** 3);
    near(Math.abs(s.reactions[0]!.moment), Math.abs((M0 * b * (2 * a - b)) / L ** 2));
    near(Math.abs(s.reactions[1]!.moment), Math.abs((M0 * a * (2 * b - a)) / L ** 2));
    // moment balance about the left end fixes the sign of the sum
    near(s.reactions[0]!.moment + s.reactions[1]!.moment + s.reactions[1]!.force * L + M0, 0, 1e-9, M0);
  });

  it("a uniform load on part of the span equals the sum of its two halves", () => {
    // superposition (common practice): the fixed-end actions of a partial load split at any point
    const L = 8;
    const whole = solveBeam(fixedFixed(L, [{ kind: "distributed", from: 1.5, to: 6, start: 7, end: 7 }]));
    const parts = solveBeam(
      fixedFixed(L, [
        { kind: "distributed", from: 1.5, to: 3.2, start: 7, end: 7 },
        { kind: "distributed", from: 3.2, to: 6, start: 7, end: 7 },
      ]),
    );
    for (let i = 0; i < 2; i++) {
      near(parts.reactions[i]!.force, whole.reactions[i]!.force, 1e-12);
      near(parts.reactions[i]!.moment, whole.reactions[i]!.moment, 1e-12);
    }
  });
});

describe("results do not depend on breakpoints", () => {
  test.prop([arbMember({ settlements: true }), fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 6 })], { numRuns: 80 })(
    "adding point loads of zero anywhere changes no value by more than rounding",
    (beam, fractions) => {
      const extra = fractions.map((f) => ({ kind: "point", at: f * beam.length, value: 0 }) as const);
      const a = solveBeam(beam);
      const b = solveBeam({ ...beam, loads: [...(beam.loads ?? []), ...extra] });
      const xs = samplePoints(beam.length);
      // the scale of each diagram is its largest value anywhere (its peaks)
      for (const key of ["shear", "moment", "slope", "deflection"] as const) {
        const scale = Math.max(Math.abs(a.peaks[key].max.value), Math.abs(a.peaks[key].min.value), 1e-300);
        for (const x of xs) expect(Math.abs(evaluatePiecewise(b[key], x) - evaluatePiecewise(a[key], x))).toBeLessThanOrEqual(1e-10 * scale);
      }
      for (let i = 0; i < a.reactions.length; i++) {
        const scale = Math.max(...a.reactions.map((r) => Math.abs(r.force)), 1e-300);
        expect(Math.abs(b.reactions[i]!.force - a.reactions[i]!.force)).toBeLessThanOrEqual(1e-10 * scale);
      }
    },
  );
});

describe("loads a hair from a support keep full precision", () => {
  // (points closer than 1e-9 of the length, the coincidence tolerance, are one point, so e starts above that)
  test.prop([fc.double({ min: 1e-7, max: 1e-5, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true })], { numRuns: 60 })(
    "a simple span with a point load at distance e from the left support: R = P (L - e) / L, M = P e (L - e) / L",
    (e, P) => {
      // AISC Steel Construction Manual, 15th ed., Table 3-23, case 8 (case number from memory)
      const L = 10;
      const s = solveBeam({
        length: L,
        stiffness: EI,
        supports: [
          { kind: "pin", at: 0 },
          { kind: "roller", at: L },
        ],
        loads: [{ kind: "point", at: e, value: P }],
      });
      // to rounding of the load scale: P for forces, P L for moments
      near(s.reactions[0]!.force, (P * (L - e)) / L, 1e-14, P);
      near(s.reactions[1]!.force, (P * e) / L, 1e-14, P);
      near(s.peaks.moment.max.value, (P * e * (L - e)) / L, 1e-14, P * L);
    },
  );
});

describe("nodeIndex (the breakpoint search)", () => {
  test.prop([fc.uniqueArray(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 2, maxLength: 60 }), fc.double({ min: -1, max: 101, noNaN: true }), fc.nat(70)])(
    "finds the nearest breakpoint from any starting hint, as bisection does",
    (values, x, hint) => {
      const nodes = Float64Array.from(values).sort();
      const i = nodeIndex(nodes, nodes.length, x, hint);
      let best = 0;
      for (let k = 1; k < nodes.length; k++) if (Math.abs(nodes[k]! - x) < Math.abs(nodes[best]! - x)) best = k;
      expect(Math.abs(nodes[i]! - x)).toBe(Math.abs(nodes[best]! - x));
    },
  );

  it("works on the shortest list", () => {
    expect(nodeIndex(new Float64Array([0, 2]), 2, 1.5, 5)).toBe(1);
    expect(nodeIndex(new Float64Array([0, 2]), 2, 0.5, 0)).toBe(0);
  });
});

describe("the one-pass peaks", () => {
  test.prop([arbMember({ settlements: true })], { numRuns: 100 })(
    "equal extremesOf on each diagram, and each diagram takes its peak value where the peak is reported",
    (beam) => {
      const s = solveBeam(beam);
      for (const key of ["shear", "moment", "slope", "deflection"] as const) {
        const reference = extremesOf(s[key]);
        const scale = Math.max(Math.abs(reference.max.value), Math.abs(reference.min.value), 1e-300);
        for (const side of ["max", "min"] as const) {
          const peak = s.peaks[key][side];
          expect(Math.abs(peak.value - reference[side].value)).toBeLessThanOrEqual(1e-12 * scale);
          const there = [evaluatePiecewise(s[key], peak.at, "left"), evaluatePiecewise(s[key], peak.at, "right")];
          expect(Math.min(...there.map((v) => Math.abs(v - peak.value)))).toBeLessThanOrEqual(1e-9 * scale);
        }
      }
    },
  );
});
