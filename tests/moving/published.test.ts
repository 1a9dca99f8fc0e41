// Influence lines against closed forms outside the project.
// - Simple span L: reaction lines 1 - a/L and a/L, the moment line at x a triangle with peak x (L - x) / L,
//   the shear line a step of 1 at a = x (any structural analysis text; from memory).
// - Cantilever fixed at x = 0: the tip deflection per unit force at a is -a^2 (3L - a) / (6 E I)
//   (AISC Steel Construction Manual, 15th ed., Table 3-23, case 21 family; from memory).
// - Two equal spans L, unit force at a = xi L in the first span: the three-moment equation (Clapeyron)
//   gives M_B = -(L / 4) xi (1 - xi^2), R_A = 1 - xi - xi (1 - xi^2) / 4, R_C = -xi (1 - xi^2) / 4
//   (from memory; the same ordinates are tabulated in handbooks of influence lines for continuous beams).
import { describe, expect, it } from "vitest";
import { solveBeam } from "../../src/beam/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";
import { influenceLine, memberInfluence } from "../../src/moving/index.js";

const near = (actual: number, expected: number, scale = 1): void => {
  if (!(Math.abs(actual - expected) <= 1e-12 * Math.max(scale, Math.abs(expected)))) expect.fail(`${actual} is not ${expected}`);
};

describe("influenceLine on a simple span (closed forms)", () => {
  const L = 7.5;
  const beam = { length: L, stiffness: 3.2e4, supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: L }] };
  const member = memberInfluence(beam);
  it("reaction lines are 1 - a/L and a/L, exactly linear (degree 1 pieces)", () => {
    for (const a of [0, 1.3, 3.75, 6.1, L]) {
      near(evaluatePiecewise(member.reactions[0]!.force!, a), 1 - a / L);
      near(evaluatePiecewise(member.reactions[1]!.force!, a), a / L);
    }
    expect(member.reactions[0]!.force!.degree).toBeLessThanOrEqual(1);
  });
  it("the moment line at x is the triangle with peak x (L - x) / L under the point", () => {
    const x = 2.9;
    const m = influenceLine(member, { kind: "moment", at: x });
    near(evaluatePiecewise(m, x), (x * (L - x)) / L, L);
    near(evaluatePiecewise(m, 1.1), (1.1 * (L - x)) / L, L);
    near(evaluatePiecewise(m, 5.2), (x * (L - 5.2)) / L, L);
  });
  it("the shear line at x steps by one at a = x: -a/L before, 1 - a/L after", () => {
    const x = 2.9;
    for (const side of ["left", "right"] as const) {
      const v = influenceLine(member, { kind: "shear", at: x, side });
      near(evaluatePiecewise(v, x, "left"), -x / L);
      near(evaluatePiecewise(v, x, "right"), 1 - x / L);
      near(evaluatePiecewise(v, 1), -1 / L);
    }
    // with no member left of x = 0, the shear just right of it is the left reaction's line
    near(evaluatePiecewise(influenceLine(member, { kind: "shear", at: 0, side: "right" }), 3), 1 - 3 / L);
  });
});

describe("influenceLine on a cantilever (closed form)", () => {
  const L = 3.2;
  const EI = 5400;
  it("the tip deflection per unit force at a is -a^2 (3L - a) / (6 E I)", () => {
    const line = influenceLine({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }] }, { kind: "deflection", at: L });
    for (const a of [0.4, 1.6, 2.75, L]) near(evaluatePiecewise(line, a), (-a * a * (3 * L - a)) / (6 * EI), (L ** 3) / EI);
  });
  it("the fixed end's moment line is a (counterclockwise on the member, lifting the tip)", () => {
    const m = memberInfluence({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }] });
    for (const a of [0.4, 1.6, L]) near(evaluatePiecewise(m.reactions[0]!.moment!, a), a, L);
  });
});

describe("influenceLine on two equal continuous spans (three-moment equation)", () => {
  const L = 6;
  const beam = { length: 2 * L, stiffness: 2.5e4, supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: L }, { kind: "roller" as const, at: 2 * L }] };
  const member = memberInfluence(beam);
  const mB = influenceLine(member, { kind: "moment", at: L });
  it("M_B = -(L/4) xi (1 - xi^2), R_A = 1 - xi - xi (1 - xi^2)/4, R_C = -xi (1 - xi^2)/4, and mirrored in span 2", () => {
    for (const xi of [0.1, 0.25, 0.5, 0.577, 0.75, 0.9]) {
      const k = xi * (1 - xi * xi);
      near(evaluatePiecewise(mB, xi * L), (-L / 4) * k, L);
      near(evaluatePiecewise(mB, 2 * L - xi * L), (-L / 4) * k, L);
      near(evaluatePiecewise(member.reactions[0]!.force!, xi * L), 1 - xi - k / 4);
      near(evaluatePiecewise(member.reactions[2]!.force!, xi * L), -k / 4);
      near(evaluatePiecewise(member.reactions[1]!.force!, xi * L), xi + k / 2);
    }
    expect(mB.degree).toBe(3);
  });
  it("the moment line at 0.4 L agrees with direct solves at 97 positions", () => {
    const line = influenceLine(member, { kind: "moment", at: 0.4 * L });
    for (let i = 0; i <= 96; i++) {
      const a = (2 * L * i) / 96;
      const direct = solveBeam({ ...beam, loads: [{ kind: "point", at: a, value: 1 }] });
      near(evaluatePiecewise(line, a), evaluatePiecewise(direct.moment, 0.4 * L), L);
    }
  });
});
