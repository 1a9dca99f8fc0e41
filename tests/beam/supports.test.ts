// Springs, settlements, prescribed rotations, guided ends, stepped E I, warnings and the
// bookkeeping of the solution (spans, contraflexure, factors).
import { describe, expect, it } from "vitest";
import { solveBeam, trySolveBeam } from "../../src/beam/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";
import { deflectionAt, momentAt, near } from "./helpers.js";

const EI = 36000;

describe("solveBeam(settlements, springs, guided ends)", () => {
  it("a propped cantilever whose roller settles by d: the roller pulls down 3EId/L^3, wall moment 3EId/L^2 hogging", () => {
    // Support-settlement moments of a fixed-pinned member (slope-deflection, common practice)
    const L = 6;
    const d = 0.012;
    const s = solveBeam({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }, { kind: "roller", at: L, settlement: d }] });
    near(s.reactions[1]!.force, (-3 * EI * d) / L ** 3);
    near(s.reactions[0]!.force, (3 * EI * d) / L ** 3);
    near(s.reactions[0]!.moment, (3 * EI * d) / L ** 2);
    near(deflectionAt(s, L), -d);
    near(momentAt(s, 0), (-3 * EI * d) / L ** 2);
  });

  it("a fixed-fixed member with one end settling by d: the settling end pulls down 12EId/L^3, end moments 6EId/L^2", () => {
    // Fixed-end moments from relative end displacement (slope-deflection, common practice)
    const L = 5;
    const d = 0.004;
    const s = solveBeam({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }, { kind: "fixed", at: L, settlement: d }] });
    near(s.reactions[1]!.force, (-12 * EI * d) / L ** 3);
    near(momentAt(s, 0), (-6 * EI * d) / L ** 2);
    near(momentAt(s, L), (6 * EI * d) / L ** 2);
    near(s.contraflexure[0]!, L / 2);
  });

  it("a fixed end turned by a prescribed rotation r: far pinned end, moment 3EIr/L at the wall", () => {
    // Stiffness of a member pinned at the far end, 3EI/L (slope-deflection, common practice)
    const L = 4;
    const r = 0.002;
    const s = solveBeam({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0, rotation: r }, { kind: "pin", at: L }] });
    near(s.reactions[0]!.moment, (3 * EI * r) / L);
    near(evaluatePiecewise(s.slope, 0), r);
  });

  it("a cantilever propped by an end spring k under an end load P: tip deflection P / (k + 3EI/L^3)", () => {
    // Springs in parallel with the cantilever's tip stiffness 3EI/L^3 (common practice)
    const L = 3;
    const P = 10;
    const k = 2000;
    const s = solveBeam({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }, { kind: "spring", at: L, stiffness: k }], loads: [{ kind: "point", at: L, value: P }] });
    const tip = -P / (k + (3 * EI) / L ** 3);
    near(deflectionAt(s, L), tip);
    near(s.reactions[1]!.force, -k * tip);
    near(s.reactions[0]!.force + s.reactions[1]!.force, P);
    expect(s.spans).toEqual([{ from: 0, to: L, kind: "span" }]);
  });

  it("a spring with settlement pushes by k times the base movement", () => {
    // Spring force -k (v - v_base), base moved down by s (common practice)
    const s = solveBeam({ length: 2, stiffness: EI, supports: [{ kind: "fixed", at: 0 }, { kind: "spring", at: 2, stiffness: 500, settlement: 0.01 }] });
    const tip = deflectionAt(s, 2);
    near(s.reactions[1]!.force, -500 * (tip + 0.01));
    expect(tip).toBeLessThan(0);
  });

  it("a rotational spring at the far end of a propped member takes its share: M = kr * theta", () => {
    const s = solveBeam({
      length: 5,
      stiffness: EI,
      supports: [{ kind: "pin", at: 0 }, { kind: "spring", at: 5, stiffness: 1e9, rotationalStiffness: 4000, rotation: 0.001 }],
      loads: [{ kind: "distributed", from: 0, to: 5, start: 2, end: 2 }],
    });
    const theta = evaluatePiecewise(s.slope, 5);
    near(s.reactions[1]!.moment, -4000 * (theta - 0.001));
  });

  it("a fixed-guided member under a load at the guided end: deflection PL^3/12EI, end moments PL/2", () => {
    // AISC Steel Construction Manual, 15th ed., Table 3-23, case 23 (case number from memory)
    const L = 4;
    const P = 9;
    const s = solveBeam({ length: L, stiffness: EI, supports: [{ kind: "fixed", at: 0 }, { kind: "guided", at: L }], loads: [{ kind: "point", at: L, value: P }] });
    near(deflectionAt(s, L), (-P * L ** 3) / (12 * EI));
    near(momentAt(s, 0), (-P * L) / 2);
    near(momentAt(s, L), (P * L) / 2);
    expect(s.reactions[1]!.force).toBe(0);
    expect(s.spans).toEqual([{ from: 0, to: L, kind: "cantilever" }]);
  });

  it("a stepped cantilever: tip deflection by the moment-area method", () => {
    // Moment-area theorem on a cantilever with two stiffnesses (common practice): tip load P,
    // E I1 over [0, a], E I2 over [a, L]: P a^3/3EI1 + P a^2 (L - a)/2EI1... written as integrals below.
    const L = 4;
    const a = 1.5;
    const P = 7;
    const EI1 = 50000;
    const EI2 = 20000;
    const s = solveBeam({
      length: L,
      stiffness: [
        { from: 0, to: a, stiffness: EI1 },
        { from: a, to: L, stiffness: EI2 },
      ],
      supports: [{ kind: "fixed", at: 0 }],
      loads: [{ kind: "point", at: L, value: P }],
    });
    // tip deflection = int_0^L M(x) (L - x) / EI dx with M = -P (L - x)
    const part = (x0: number, x1: number, ei: number) => (-P * ((L - x0) ** 3 - (L - x1) ** 3)) / (3 * ei);
    near(deflectionAt(s, L), part(0, a, EI1) + part(a, L, EI2));
  });
});

describe("solveBeam results bookkeeping", () => {
  it("spans and cantilevers between supports that hold deflection", () => {
    const s = solveBeam({
      length: 12,
      stiffness: EI,
      supports: [{ kind: "pin", at: 1 }, { kind: "roller", at: 5 }, { kind: "guided", at: 8 }, { kind: "roller", at: 10 }],
      loads: [{ kind: "distributed", from: 0, to: 12, start: 1, end: 1 }],
    });
    expect(s.spans).toEqual([
      { from: 0, to: 1, kind: "cantilever" },
      { from: 1, to: 5, kind: "span" },
      { from: 5, to: 10, kind: "span" },
      { from: 10, to: 12, kind: "cantilever" },
    ]);
    expect(Object.isFrozen(s)).toBe(true);
    expect(Object.isFrozen(s.reactions[0])).toBe(true);
  });

  it("a couple whose jump crosses zero counts as a point of contraflexure", () => {
    // Simple span with a central counterclockwise couple C: M jumps from +C/2 to -C/2 at midspan
    // (common practice)
    const s = solveBeam({ length: 4, stiffness: EI, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }], loads: [{ kind: "couple", at: 2, value: 10 }] });
    near(s.reactions[0]!.force, 10 / 4);
    near(momentAt(s, 2, "left"), 5);
    near(momentAt(s, 2, "right"), -5);
    expect(s.contraflexure).toEqual([2]);
  });

  it("an unloaded overhang gives no spurious point of contraflexure", () => {
    const s = solveBeam({ length: 8, stiffness: EI, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }], loads: [{ kind: "point", at: 3, value: 10 }] });
    expect(s.contraflexure).toEqual([]);
  });

  it("load-case factors: a combination scales its cases and drops the others", () => {
    const beam = {
      length: 6,
      stiffness: EI,
      supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }],
      loads: [
        { kind: "distributed", from: 0, to: 6, start: 2, end: 2, case: "dead" },
        { kind: "point", at: 3, value: 10, case: "live" },
        { kind: "point", at: 1, value: 100, case: "wind" },
        { kind: "couple", at: 2, value: 5 },
      ],
    } as const;
    const s = solveBeam(beam, { factors: { dead: 1.2, live: 1.6 } });
    near(s.reactions[0]!.force + s.reactions[1]!.force, 1.2 * 12 + 1.6 * 10);
    const all = solveBeam(beam);
    near(all.reactions[0]!.force + all.reactions[1]!.force, 12 + 10 + 100);
    const withDefault = solveBeam(beam, { factors: { default: 2 } });
    near(withDefault.reactions[0]!.force, (2 * 5) / 6); // a counterclockwise couple lifts the left end's reaction
  });
});

describe("solveBeam warnings", () => {
  it("a spring far stiffer than the member gets an ill-conditioned warning", () => {
    const s = solveBeam({ length: 6, stiffness: 1, supports: [{ kind: "pin", at: 0 }, { kind: "spring", at: 6, stiffness: 1e14 }], loads: [{ kind: "point", at: 3, value: 1 }] });
    expect(s.warnings.map((w) => [w.code, w["field"]])).toEqual([["ill-conditioned", "stiffness"]]);
    expect(s.warnings[0]!.message).toMatch(/rigid support/);
  });

  it("a vanishingly soft spring gets warnings (spring ratio and lost digits)", () => {
    const s = solveBeam({
      length: 6,
      stiffness: 1e6,
      supports: [{ kind: "pin", at: 0 }, { kind: "spring", at: 6, stiffness: 1e-9, rotationalStiffness: 1e-9 }],
      loads: [{ kind: "point", at: 3, value: 1 }],
    });
    const codes = s.warnings.map((w) => w.code);
    expect(codes.length).toBeGreaterThanOrEqual(2);
    expect(new Set(codes)).toEqual(new Set(["ill-conditioned"]));
    expect(s.warnings.some((w) => typeof w["pivotRatio"] === "number")).toBe(true);
  });

  it("a float64-singular member (springs too soft to register) is a mechanism, not garbage", () => {
    const r = trySolveBeam({ length: 6, stiffness: 1e6, supports: [{ kind: "pin", at: 0 }, { kind: "spring", at: 6, stiffness: 1e-30 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect([r.error.code, r.error.issues[0]!["reason"]]).toEqual(["mechanism", "singular"]);
  });

  it("a member with a soft part beside a short stiff element reports its out-of-balance", () => {
    const s = solveBeam({
      length: 1,
      stiffness: 1000,
      hinges: [0.328125],
      supports: [{ kind: "pin", at: 0 }, { kind: "pin", at: 0.34375 }, { kind: "spring", at: 0.09375, stiffness: 100 }],
      loads: [{ kind: "couple", at: 0, value: -0.125 }],
    });
    expect(s.warnings.map((w) => w.code)).toContain("ill-conditioned");
  });

  it("rejects a rotational restraint or a couple exactly at a hinge", () => {
    const r = trySolveBeam({
      length: 6,
      stiffness: 1,
      hinges: [3],
      supports: [{ kind: "pin", at: 0 }, { kind: "fixed", at: 3 }, { kind: "roller", at: 6 }],
      loads: [{ kind: "couple", at: 3, value: 1 }],
    });
    expect(r.ok || r.error.issues.map((i) => `${i.code} @ ${i.path.join(".")}`)).toEqual(["hinge-at-rotational-support @ supports.1.at", "couple-at-hinge @ loads.0.at"]);
  });
});
