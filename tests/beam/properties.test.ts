// The laws every solution must obey, on random stable members (random supports, hinges,
// stepped E I and loads). Beam theory (Euler-Bernoulli): dM/dx = V, dV/dx = -w, E I y'' = M;
// equilibrium; superposition and Maxwell-Betti reciprocity for a linear elastic member.
import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamInput, type BeamSolution } from "../../src/beam/index.js";
import { derivativeOf, evaluatePiecewise, type PiecewisePolynomial } from "../../src/math/index.js";
import type { Load } from "../../src/loads/index.js";
import type { Support } from "../../src/supports/index.js";
import { actionScale, arbLoad, displacementScale, arbMember, intensityAt, samplePoints, stiffnessAt } from "./arbitraries.js";

const RUNS = { numRuns: 120 };

/** Largest absolute value of a piecewise polynomial at the sample points and piece ends. */
function size(pp: PiecewisePolynomial, xs: readonly number[]): number {
  let m = 0;
  for (const x of xs) m = Math.max(m, Math.abs(evaluatePiecewise(pp, x)));
  for (const b of pp.breaks) m = Math.max(m, Math.abs(evaluatePiecewise(pp, b, "left")), Math.abs(evaluatePiecewise(pp, b, "right")));
  return m;
}

// Tolerances: random members include springs 1e8 times softer than the short elements beside
// them and hinges a hair from supports, where float64 itself leaves about 1e-8 (machine epsilon
// times the condition number), so the laws are checked to 1e-7 of their scale by default.
// Maxwell-Betti is checked to 1e-8: loads add no elements, and a lever on a spring with a hinge
// (pins at 0 and 0.21875, spring 100 at 0.015625, hinge at 0.109375, E I 1000, unit loads at
// 61/64 and 37/64) that lost 1e-7 when every load made a node now agrees to 2e-16.
function expectClose(actual: number, expected: number, scale: number, rel = 1e-7): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * scale + 1e-300);
}

describe("solveBeam laws on random stable members", () => {
  test.prop([arbMember({ settlements: true })], RUNS)("equilibrium: the residual is below 1e-9 of the load scale", (beam) => {
    const s = solveBeam(beam);
    const scale = actionScale(beam, s.reactions);
    expect(Math.abs(s.residual.force)).toBeLessThanOrEqual(1e-9 * scale.force);
    expect(Math.abs(s.residual.moment)).toBeLessThanOrEqual(1e-9 * scale.moment);
  });

  test.prop([arbMember({ settlements: true })], RUNS)("dM/dx = V, dV/dx = -w and E I y'' = M on every piece", (beam) => {
    const s = solveBeam(beam);
    const xs = samplePoints(beam.length);
    const dM = derivativeOf(s.moment);
    const dV = derivativeOf(s.shear);
    const curvature = derivativeOf(derivativeOf(s.deflection));
    const slopeFromDeflection = derivativeOf(s.deflection);
    const scale = actionScale(beam, s.reactions);
    const vScale = size(s.shear, xs) + scale.force;
    const mScale = size(s.moment, xs) + scale.moment;
    const wScale = Math.max(...xs.map((x) => Math.abs(intensityAt(beam, x))), 1e-12);
    const tScale = size(s.slope, xs) + displacementScale(beam) / beam.length + 1e-15;
    for (const x of xs) {
      expectClose(evaluatePiecewise(dM, x), evaluatePiecewise(s.shear, x), vScale);
      expectClose(evaluatePiecewise(dV, x), -intensityAt(beam, x), wScale + vScale / beam.length);
      expectClose(evaluatePiecewise(curvature, x) * stiffnessAt(beam, x), evaluatePiecewise(s.moment, x), mScale, 1e-6);
      expectClose(evaluatePiecewise(slopeFromDeflection, x), evaluatePiecewise(s.slope, x), tScale, 1e-6);
    }
  });

  test.prop([arbMember({ settlements: true })], RUNS)("support conditions are met; M = 0 at hinges and at free ends; deflection is continuous", (beam) => {
    const s = solveBeam(beam);
    const xs = samplePoints(beam.length);
    const scale = actionScale(beam, s.reactions);
    const yScale = size(s.deflection, xs) + displacementScale(beam) + 1e-12;
    const tScale = size(s.slope, xs) + yScale / beam.length;
    const mScale = size(s.moment, xs) + scale.moment;
    beam.supports.forEach((sup: Support, i) => {
      const y = evaluatePiecewise(s.deflection, sup.at);
      // the right-hand limit (the value on the member at the right end)
      const t = evaluatePiecewise(s.slope, sup.at);
      const r = s.reactions[i]!;
      switch (sup.kind) {
        case "pin":
        case "roller":
          expectClose(y, -(sup.settlement ?? 0), yScale);
          expect(r.moment).toBe(0);
          break;
        case "fixed":
          expectClose(y, -(sup.settlement ?? 0), yScale);
          expectClose(t, sup.rotation ?? 0, tScale);
          break;
        case "guided":
          expectClose(t, sup.rotation ?? 0, tScale);
          expect(r.force).toBe(0);
          break;
        case "spring":
          if (sup.stiffness !== undefined) expectClose(r.force, -sup.stiffness * (y + (sup.settlement ?? 0)), scale.force, 1e-6);
          else expect(r.force).toBe(0);
          if (sup.rotationalStiffness !== undefined) expectClose(r.moment, -sup.rotationalStiffness * (t - (sup.rotation ?? 0)), Math.abs(r.moment) + mScale, 1e-6);
          else expect(r.moment).toBe(0);
          break;
      }
    });
    for (const h of beam.hinges ?? []) {
      const coupleThere = (beam.loads ?? []).some((l) => l.kind === "couple" && Math.abs(l.at - h) < 1e-12);
      expectClose(evaluatePiecewise(s.moment, h, "left"), 0, mScale, 1e-7);
      if (!coupleThere) expectClose(evaluatePiecewise(s.moment, h, "right"), 0, mScale, 1e-7);
      expectClose(evaluatePiecewise(s.deflection, h, "left"), evaluatePiecewise(s.deflection, h, "right"), yScale);
    }
    for (const end of [0, beam.length]) {
      const supported = beam.supports.some((p) => Math.abs(p.at - end) < 1e-12 && p.kind !== "pin" && p.kind !== "roller");
      const loaded = (beam.loads ?? []).some((l) => l.kind === "couple" && Math.abs(l.at - end) < 1e-12);
      if (!supported && !loaded) expectClose(evaluatePiecewise(s.moment, end), 0, mScale, 1e-7);
    }
  });

  test.prop([arbMember({ hinges: true }), fc.array(fc.integer({ min: 0, max: 1e6 }), { maxLength: 4 })], RUNS)(
    "superposition: solving two load sets together equals the sum of solving them apart",
    (beam, extraSeeds) => {
      const half = Math.floor((beam.loads ?? []).length / 2);
      const a: BeamInput = { ...beam, loads: (beam.loads ?? []).slice(0, half) };
      const b: BeamInput = { ...beam, loads: (beam.loads ?? []).slice(half) };
      void extraSeeds;
      const sa = solveBeam(a);
      const sb = solveBeam(b);
      const s = solveBeam(beam);
      const xs = samplePoints(beam.length);
      const actions = actionScale(beam, s.reactions);
      const scale = (pp: (q: BeamSolution) => PiecewisePolynomial) => size(pp(sa), xs) + size(pp(sb), xs) + 1e-12;
      s.reactions.forEach((r, i) => expectClose(r.force, sa.reactions[i]!.force + sb.reactions[i]!.force, actions.force));
      for (const x of xs) {
        expectClose(evaluatePiecewise(s.moment, x), evaluatePiecewise(sa.moment, x) + evaluatePiecewise(sb.moment, x), scale((q) => q.moment) + actions.moment);
        expectClose(evaluatePiecewise(s.deflection, x), evaluatePiecewise(sa.deflection, x) + evaluatePiecewise(sb.deflection, x), scale((q) => q.deflection));
      }
    },
  );

  test.prop([arbMember({ maxLoads: 0 }), fc.integer({ min: 0, max: 64 }), fc.integer({ min: 0, max: 64 })], RUNS)(
    "reciprocity (Maxwell-Betti): deflection at x2 under a unit load at x1 equals deflection at x1 under a unit load at x2",
    (beam, g1, g2) => {
      const x1 = (g1 * beam.length) / 64;
      const x2 = (g2 * beam.length) / 64;
      const s1 = solveBeam({ ...beam, loads: [{ kind: "point", at: x1, value: 1 }] });
      const s2 = solveBeam({ ...beam, loads: [{ kind: "point", at: x2, value: 1 }] });
      const d12 = evaluatePiecewise(s1.deflection, x2);
      const d21 = evaluatePiecewise(s2.deflection, x1);
      const scale = Math.max(size(s1.deflection, [x1, x2]), size(s2.deflection, [x1, x2]), 1e-300);
      expectClose(d12, d21, scale, 1e-8);
    },
  );

  test.prop([arbMember({ settlements: true })], RUNS)("mirror symmetry: the mirrored member gives the mirrored results", (beam) => {
    const L = beam.length;
    const mirrorLoad = (l: Load): Load => {
      switch (l.kind) {
        case "point":
          return { ...l, at: L - l.at };
        case "couple":
          return { ...l, at: L - l.at, value: -l.value };
        case "distributed":
          return { ...l, from: L - l.to, to: L - l.from, start: l.end, end: l.start };
      }
    };
    const mirrored: BeamInput = {
      length: L,
      stiffness: typeof beam.stiffness === "number" ? beam.stiffness : [...beam.stiffness].reverse().map((s) => ({ from: L - s.to, to: L - s.from, stiffness: s.stiffness })),
      supports: beam.supports.map((s) => ({ ...s, at: L - s.at, ...(s.rotation !== undefined ? { rotation: -s.rotation } : {}) })),
      hinges: (beam.hinges ?? []).map((h) => L - h),
      loads: (beam.loads ?? []).map(mirrorLoad),
    };
    const s = solveBeam(beam);
    const m = solveBeam(mirrored);
    const xs = samplePoints(L);
    const actions = actionScale(beam, s.reactions);
    s.reactions.forEach((r, i) => {
      expectClose(m.reactions[i]!.force, r.force, actions.force);
      expectClose(m.reactions[i]!.moment, -r.moment, actions.moment);
    });
    for (const x of xs) {
      expectClose(evaluatePiecewise(m.moment, L - x), evaluatePiecewise(s.moment, x), actions.moment);
      expectClose(evaluatePiecewise(m.shear, L - x), -evaluatePiecewise(s.shear, x), actions.force);
      const y = size(s.deflection, xs) + displacementScale(beam);
      expectClose(evaluatePiecewise(m.deflection, L - x), evaluatePiecewise(s.deflection, x), y);
      expectClose(evaluatePiecewise(m.slope, L - x), -evaluatePiecewise(s.slope, x), size(s.slope, xs) + y / L);
    }
  });

  test.prop([arbMember({ settlements: true }), fc.integer({ min: 1, max: 40 }).map((v) => v / 8), fc.integer({ min: -40, max: 40 }).filter((v) => v !== 0).map((v) => v / 8)], RUNS)(
    "scaling: lengths by k (with E I by k^2, w by 1/k, couples by k, springs to match) and loads by a",
    (beam, k, a) => {
      const scaleLoad = (l: Load): Load => {
        switch (l.kind) {
          case "point":
            return { ...l, at: l.at * k, value: l.value * a };
          case "couple":
            return { ...l, at: l.at * k, value: l.value * a * k };
          case "distributed":
            return { ...l, from: l.from * k, to: l.to * k, start: (l.start * a) / k, end: (l.end * a) / k };
        }
      };
      const scaled: BeamInput = {
        length: beam.length * k,
        stiffness: typeof beam.stiffness === "number" ? beam.stiffness * k * k : beam.stiffness.map((s) => ({ from: s.from * k, to: s.to * k, stiffness: s.stiffness * k * k })),
        supports: beam.supports.map((s) => ({
          ...s,
          at: s.at * k,
          ...(s.stiffness !== undefined ? { stiffness: s.stiffness / k } : {}),
          ...(s.rotationalStiffness !== undefined ? { rotationalStiffness: s.rotationalStiffness * k } : {}),
          ...(s.settlement !== undefined ? { settlement: s.settlement * k * a } : {}),
          ...(s.rotation !== undefined ? { rotation: s.rotation * a } : {}),
        })),
        hinges: (beam.hinges ?? []).map((h) => h * k),
        loads: (beam.loads ?? []).map(scaleLoad),
      };
      const s = solveBeam(beam);
      const t = solveBeam(scaled);
      const xs = samplePoints(beam.length);
      const actions = actionScale(beam, s.reactions);
      s.reactions.forEach((r, i) => {
        expectClose(t.reactions[i]!.force, a * r.force, Math.abs(a) * actions.force);
        expectClose(t.reactions[i]!.moment, a * k * r.moment, Math.abs(a * k) * actions.moment);
      });
      for (const x of xs) {
        expectClose(evaluatePiecewise(t.moment, x * k), a * k * evaluatePiecewise(s.moment, x), Math.abs(a * k) * actions.moment);
        expectClose(evaluatePiecewise(t.deflection, x * k), a * k * evaluatePiecewise(s.deflection, x), Math.abs(a * k) * (size(s.deflection, xs) + displacementScale(beam)));
      }
      expectClose(t.peaks.moment.max.value, a > 0 ? a * k * s.peaks.moment.max.value : a * k * s.peaks.moment.min.value, Math.abs(a * k) * actions.moment);
    },
  );
});

describe("solveBeam load cases", () => {
  test.prop([arbMember({ hinges: false }), fc.array(arbLoad(10), { maxLength: 3 })], { numRuns: 60 })(
    "factors scale each case; cases not named get 0; without factors every load counts once",
    (beam, _extra) => {
      const loads = (beam.loads ?? []).map((l, i) => ({ ...l, case: i % 2 === 0 ? "dead" : "live" }));
      const plain = (beam.loads ?? []).filter((_, i) => i % 2 === 0);
      const withCases: BeamInput = { ...beam, loads: [...loads, { kind: "point", at: 0, value: 99 }] };
      const combo = solveBeam(withCases, { factors: { dead: 1.5 } });
      const reference = solveBeam({ ...beam, loads: plain });
      const actions = actionScale(withCases, combo.reactions);
      combo.reactions.forEach((r, i) => expectClose(r.force, 1.5 * reference.reactions[i]!.force, 1.5 * actions.force));
      const all = solveBeam(withCases);
      const sum = solveBeam({ ...beam, loads: [...(beam.loads ?? []), { kind: "point", at: 0, value: 99 }] });
      all.reactions.forEach((r, i) => expectClose(r.force, sum.reactions[i]!.force, actions.force + 99));
    },
  );
});
