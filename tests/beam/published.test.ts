// Published closed-form cases. Each check names its source; case numbers marked "from memory"
// were recalled without the table at hand (the formulas themselves are the standard ones).
import { describe, it } from "vitest";
import { solveBeam } from "../../src/beam/index.js";
import { deflectionAt, momentAt, near } from "./helpers.js";

const EI = 2.1e8 * 1.2e-4; // an invented steel member, kN m^2
const pin = (at: number) => ({ kind: "pin", at }) as const;
const roller = (at: number) => ({ kind: "roller", at }) as const;
const fixed = (at: number) => ({ kind: "fixed", at }) as const;

describe("solveBeam against handbook beam-formula tables", () => {
  it("solve(simple span, central point load): R = P/2, M = PL/4 and deflection PL^3/48EI at midspan", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 7 (case number from memory)
    const L = 7.5;
    const P = 42;
    const s = solveBeam({ length: L, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "point", at: L / 2, value: P }] });
    near(s.reactions[0]!.force, P / 2);
    near(s.reactions[1]!.force, P / 2);
    near(s.peaks.moment.max.value, (P * L) / 4);
    near(s.peaks.moment.max.at, L / 2);
    near(s.peaks.deflection.min.value, (-P * L ** 3) / (48 * EI));
    near(s.peaks.deflection.min.at, L / 2, 1e-7);
  });

  it("solve(simple span, off-centre point load): M = Pab/L under the load; peak deflection at sqrt(a(a+2b)/3)", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 8 (case number from memory)
    const L = 9;
    const a = 5.5;
    const b = L - a;
    const P = 30;
    const s = solveBeam({ length: L, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "point", at: a, value: P }] });
    near(s.reactions[0]!.force, (P * b) / L);
    near(s.reactions[1]!.force, (P * a) / L);
    near(s.peaks.moment.max.value, (P * a * b) / L);
    near(s.peaks.moment.max.at, a);
    const xm = Math.sqrt((a * (a + 2 * b)) / 3);
    near(s.peaks.deflection.min.at, xm);
    near(s.peaks.deflection.min.value, -(P * a * b * (a + 2 * b) * Math.sqrt(3 * a * (a + 2 * b))) / (27 * EI * L));
  });

  it("solve(simple span, full uniform load): R = wL/2, M = wL^2/8 and deflection 5wL^4/384EI at midspan", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 1 (case number from memory)
    const L = 8;
    const w = 12.5;
    const s = solveBeam({ length: L, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w }] });
    near(s.reactions[0]!.force, (w * L) / 2);
    near(s.reactions[1]!.force, (w * L) / 2);
    near(s.peaks.moment.max.value, (w * L * L) / 8);
    near(s.peaks.moment.max.at, L / 2);
    near(s.peaks.deflection.min.value, (-5 * w * L ** 4) / (384 * EI));
    near(s.peaks.deflection.min.at, L / 2, 1e-7);
    near(s.peaks.shear.max.value, (w * L) / 2);
  });

  it("solve(simple span, triangular load rising to one end): R = W/3 and 2W/3, M = 2WL/(9 sqrt 3) at L/sqrt 3", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 2 (case number from memory);
    // deflection y = w0 x (7L^4 - 10L^2 x^2 + 3x^4) / (360 EI L), peak at x = L sqrt(1 - sqrt(8/15))
    // (Roark's Formulas for Stress and Strain, 8th ed., Table 8.1, case 2e with wa = 0, from memory)
    const L = 6;
    const w0 = 18;
    const W = (w0 * L) / 2;
    const s = solveBeam({ length: L, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "distributed", from: 0, to: L, start: 0, end: w0 }] });
    near(s.reactions[0]!.force, W / 3);
    near(s.reactions[1]!.force, (2 * W) / 3);
    near(s.peaks.moment.max.value, (2 * W * L) / (9 * Math.sqrt(3)));
    near(s.peaks.moment.max.at, L / Math.sqrt(3));
    const xm = L * Math.sqrt(1 - Math.sqrt(8 / 15));
    near(s.peaks.deflection.min.at, xm, 1e-7);
    near(s.peaks.deflection.min.value, -(w0 * xm * (7 * L ** 4 - 10 * L * L * xm * xm + 3 * xm ** 4)) / (360 * EI * L));
  });

  it("solve(cantilever, end load): R = P, M = -PL at the wall, tip deflection PL^3/3EI", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 22 (case number from memory)
    const L = 3.2;
    const P = 15;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(0)], loads: [{ kind: "point", at: L, value: P }] });
    near(s.reactions[0]!.force, P);
    near(s.reactions[0]!.moment, P * L);
    near(s.peaks.moment.min.value, -P * L);
    near(s.peaks.moment.min.at, 0);
    near(s.peaks.deflection.min.value, (-P * L ** 3) / (3 * EI));
    near(s.peaks.deflection.min.at, L);
    near(s.peaks.slope.min.value, (-P * L * L) / (2 * EI));
  });

  it("solve(cantilever, uniform load): R = wL, M = -wL^2/2 at the wall, tip deflection wL^4/8EI", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 19 (case number from memory)
    const L = 2.75;
    const w = 9;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(L)], loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w }] });
    near(s.reactions[0]!.force, w * L);
    near(s.reactions[0]!.moment, (-w * L * L) / 2); // wall on the right: clockwise reaction
    near(s.peaks.moment.min.value, (-w * L * L) / 2);
    near(s.peaks.moment.min.at, L);
    near(s.peaks.deflection.min.value, (-w * L ** 4) / (8 * EI));
    near(s.peaks.deflection.min.at, 0);
  });

  it("solve(cantilever, end couple): constant moment M0, tip deflection M0 L^2/2EI", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table 8.1, case 3a (case number from memory)
    const L = 4;
    const M0 = 25;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(0)], loads: [{ kind: "couple", at: L, value: M0 }] });
    near(s.reactions[0]!.force, 0, 1e-9, M0 / L);
    near(s.reactions[0]!.moment, -M0);
    near(momentAt(s, L / 3), M0);
    near(s.peaks.deflection.max.value, (M0 * L * L) / (2 * EI));
    near(s.peaks.deflection.max.at, L);
    near(s.peaks.slope.max.value, (M0 * L) / EI);
  });

  it("solve(propped cantilever, uniform load): 5wL/8 and 3wL/8, -wL^2/8 at the wall, 9wL^2/128, wL^4/185EI", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 12 (case number from memory);
    // exact peak deflection: y = w x (L^3 - 3 L x^2 + 2 x^3) / 48EI from the roller, at x = L (1 + sqrt 33) / 16
    const L = 10;
    const w = 4;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(0), roller(L)], loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w }] });
    near(s.reactions[0]!.force, (5 * w * L) / 8);
    near(s.reactions[1]!.force, (3 * w * L) / 8);
    near(s.reactions[0]!.moment, (w * L * L) / 8);
    near(s.peaks.moment.min.value, (-w * L * L) / 8);
    near(s.peaks.moment.max.value, (9 * w * L * L) / 128);
    near(s.peaks.moment.max.at, (5 * L) / 8);
    const xr = (L * (1 + Math.sqrt(33))) / 16;
    near(s.peaks.deflection.min.at, L - xr, 1e-7);
    near(s.peaks.deflection.min.value, -(w * xr * (L ** 3 - 3 * L * xr * xr + 2 * xr ** 3)) / (48 * EI));
    near(s.contraflexure[0]!, L / 4); // zero moment 3L/4 from the roller (common practice: M = 0 at 2 * 3L/8)
  });

  it("solve(fixed-fixed, uniform load): wL/2, -wL^2/12 at the ends, wL^2/24 and wL^4/384EI at midspan", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 15 (case number from memory)
    const L = 12;
    const w = 6;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(0), fixed(L)], loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w }] });
    near(s.reactions[0]!.force, (w * L) / 2);
    near(s.reactions[1]!.force, (w * L) / 2);
    near(s.reactions[0]!.moment, (w * L * L) / 12);
    near(s.reactions[1]!.moment, (-w * L * L) / 12);
    near(s.peaks.moment.min.value, (-w * L * L) / 12);
    near(s.peaks.moment.max.value, (w * L * L) / 24);
    near(s.peaks.moment.max.at, L / 2);
    near(s.peaks.deflection.min.value, (-w * L ** 4) / (384 * EI));
    near(s.peaks.deflection.min.at, L / 2, 1e-7);
    // points of zero moment at L (1/2 -+ sqrt(3)/6): same table, from memory
    near(s.contraflexure[0]!, L * (0.5 - Math.sqrt(3) / 6));
    near(s.contraflexure[1]!, L * (0.5 + Math.sqrt(3) / 6));
  });

  it("solve(fixed-fixed, off-centre point load): Pb^2(3a+b)/L^3, -Pab^2/L^2, 2Pa^2b^2/L^3, 2Pa^3b^2/3EI(3a+b)^2", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 17 (case number from memory)
    const L = 8;
    const a = 5;
    const b = L - a;
    const P = 50;
    const s = solveBeam({ length: L, stiffness: EI, supports: [fixed(0), fixed(L)], loads: [{ kind: "point", at: a, value: P }] });
    near(s.reactions[0]!.force, (P * b * b * (3 * a + b)) / L ** 3);
    near(s.reactions[1]!.force, (P * a * a * (a + 3 * b)) / L ** 3);
    near(s.reactions[0]!.moment, (P * a * b * b) / (L * L));
    near(s.reactions[1]!.moment, (-P * a * a * b) / (L * L));
    near(s.peaks.moment.max.value, (2 * P * a * a * b * b) / L ** 3);
    near(s.peaks.moment.max.at, a);
    near(s.peaks.moment.min.value, (-P * a * a * b) / (L * L));
    near(s.peaks.moment.min.at, L);
    near(s.peaks.deflection.min.value, (-2 * P * a ** 3 * b * b) / (3 * EI * (3 * a + b) ** 2));
    near(s.peaks.deflection.min.at, (2 * a * L) / (3 * a + b), 1e-7);
  });

  it("solve(two equal continuous spans, uniform load): 3wL/8, 5wL/4, -wL^2/8 over the middle support", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, continuous beam, two equal spans,
    // uniform load on both (case number not recalled); by symmetry each span is the propped
    // cantilever of case 12 (common practice), so 9wL^2/128 at 3L/8 and wL^4/185EI as there.
    const L = 5;
    const w = 10;
    const s = solveBeam({
      length: 2 * L,
      stiffness: EI,
      supports: [pin(0), roller(L), roller(2 * L)],
      loads: [{ kind: "distributed", from: 0, to: 2 * L, start: w, end: w }],
    });
    near(s.reactions[0]!.force, (3 * w * L) / 8);
    near(s.reactions[1]!.force, (5 * w * L) / 4);
    near(s.reactions[2]!.force, (3 * w * L) / 8);
    near(s.peaks.moment.min.value, (-w * L * L) / 8);
    near(s.peaks.moment.min.at, L);
    near(s.peaks.moment.max.value, (9 * w * L * L) / 128);
    const xr = (L * (1 + Math.sqrt(33))) / 16;
    near(s.peaks.deflection.min.value, -(w * xr * (L ** 3 - 3 * L * xr * xr + 2 * xr ** 3)) / (48 * EI));
    near(Math.min(s.peaks.deflection.min.at, 2 * L - s.peaks.deflection.min.at), xr, 1e-7);
  });

  it("solve(beam overhanging one support, load at the overhang end): Pa/L down, P(L+a)/L up, Pa^2(L+a)/3EI", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 26 (case number from memory)
    const L = 6;
    const a = 2;
    const P = 20;
    const s = solveBeam({ length: L + a, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "point", at: L + a, value: P }] });
    near(s.reactions[0]!.force, (-P * a) / L);
    near(s.reactions[1]!.force, (P * (L + a)) / L);
    near(s.peaks.moment.min.value, -P * a);
    near(s.peaks.moment.min.at, L);
    near(s.peaks.deflection.min.value, (-P * a * a * (L + a)) / (3 * EI));
    near(s.peaks.deflection.min.at, L + a);
    // the back span lifts: P a L^2 / (9 sqrt(3) EI) at L / sqrt(3), same table
    near(s.peaks.deflection.max.value, (P * a * L * L) / (9 * Math.sqrt(3) * EI));
    near(s.peaks.deflection.max.at, L / Math.sqrt(3), 1e-7);
    near(deflectionAt(s, L), 0, 1e-9, Math.abs(s.peaks.deflection.min.value));
  });

  it("solve(beam overhanging one support, uniform load throughout): w(L^2 - a^2)/2L and w(L+a)^2/2L", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 24 (case number from memory)
    const L = 7;
    const a = 2;
    const w = 3;
    const s = solveBeam({ length: L + a, stiffness: EI, supports: [pin(0), roller(L)], loads: [{ kind: "distributed", from: 0, to: L + a, start: w, end: w }] });
    near(s.reactions[0]!.force, (w * (L * L - a * a)) / (2 * L));
    near(s.reactions[1]!.force, (w * (L + a) ** 2) / (2 * L));
    near(s.peaks.moment.max.value, (w * (L + a) ** 2 * (L - a) ** 2) / (8 * L * L));
    near(s.peaks.moment.max.at, (L / 2) * (1 - (a * a) / (L * L)));
    near(s.peaks.moment.min.value, (-w * a * a) / 2);
  });

  it("solve(member with an internal hinge): a fixed-end cantilever carrying a simple span on a hinge", () => {
    // Statics of a hinged (Gerber) member, common practice; the cantilever's tip deflection
    // superposes AISC Steel Construction Manual, 15th ed., Table 3-23, cases 19 and 22 (from memory).
    const L = 10;
    const a = 4; // hinge
    const w = 5;
    const s = solveBeam({
      length: L,
      stiffness: EI,
      hinges: [a],
      supports: [fixed(0), roller(L)],
      loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w }],
    });
    const P = (w * (L - a)) / 2; // the simple span's end shear passed through the hinge
    near(s.reactions[1]!.force, P);
    near(s.reactions[0]!.force, w * a + P);
    near(s.reactions[0]!.moment, (w * a * a) / 2 + P * a);
    near(momentAt(s, a), 0, 1e-9, (w * a * a) / 2 + P * a);
    near(s.peaks.moment.min.value, -((w * a * a) / 2 + P * a));
    near(deflectionAt(s, a), -((w * a ** 4) / (8 * EI) + (P * a ** 3) / (3 * EI)));
  });
});
