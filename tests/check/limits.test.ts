import { describe, expect, it } from "vitest";
import { solveBeam } from "../../src/beam/index.js";
import { checkMember, checkResult, tryCheckMember, type MemberLimits, type MemberSection } from "../../src/check/index.js";

// An invented simple span, 6 units long, E I = 1, a unit point load at midspan (units consistent, arbitrary).
const solution = solveBeam({ length: 6, stiffness: 1, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }], loads: [{ kind: "point", at: 3, value: 1 }] });
const section: MemberSection = { properties: { secondMomentZ: 1, extremes: { top: 1, bottom: -1 } } };
const codes = (limits: unknown): string[] => {
  const r = tryCheckMember(solution, section, limits as MemberLimits);
  return r.ok ? [] : r.error.issues.map((i) => i.code);
};
const paths = (limits: unknown): string[] => {
  const r = tryCheckMember(solution, section, limits as MemberLimits);
  return r.ok ? [] : r.error.issues.map((i) => i.path.join("."));
};

describe("checkMember never passes without a check", () => {
  it("limits that are not an object are a typed error, not a pass", () => {
    for (const bad of [5, "165", null, undefined, [], true, () => 1]) {
      expect(codes(bad)).toEqual(["limits-not-an-object"]);
      expect(paths(bad)).toEqual(["limits"]);
    }
  });

  it("empty limits are a typed error: nothing would be checked", () => {
    expect(codes({})).toEqual(["limits-empty"]);
    expect(codes({ bendingStress: undefined })).toEqual(["limits-empty"]);
    expect(codes({ deflection: [] })).toEqual(["limits-empty"]);
    expect(codes({ bendingStressByPart: [] })).toEqual(["limits-empty"]);
    expect(codes({ bendingStressByPart: [null, null] })).toEqual(["limits-empty"]);
  });

  it("a misspelt limit is an unknown field with a suggestion, not silently ignored", () => {
    const r = tryCheckMember(solution, section, { bendingstress: 5 } as unknown as MemberLimits);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.issues.map((i) => [i.code, i.path.join(".")])).toEqual([
      ["unknown-field", "limits.bendingstress"],
      ["limits-empty", "limits"],
    ]);
    expect(r.error.issues[0]?.message).toContain('Did you mean "bendingStress"?');
  });

  it("keys named after Object.prototype members are unknown fields too", () => {
    const limits = JSON.parse('{"bendingStress": 5, "__proto__": {"shearStress": 1}, "constructor": 1}') as MemberLimits;
    expect(codes(limits)).toEqual(["unknown-field", "unknown-field"]);
  });

  it("malformed lists and deflection limits are typed errors", () => {
    expect(codes({ bendingStressByPart: 5 })).toEqual(["not-a-list"]);
    expect(paths({ bendingStressByPart: 5 })).toEqual(["limits.bendingStressByPart"]);
    expect(codes({ deflection: "span/360" })).toEqual(["deflection-limit-invalid"]);
    expect(codes({ deflection: [null] })).toEqual(["deflection-limit-invalid"]);
    expect(codes({ deflection: {} })).toEqual(["unknown-limit-kind"]);
    expect(codes({ bendingStress: { tension: 5 } })).toEqual(["not-a-number"]);
  });

  it("an inherited limit is not read (own properties only)", () => {
    const limits = Object.create({ bendingStress: 5 }) as MemberLimits;
    expect(codes(limits)).toEqual(["limits-empty"]);
  });

  it("a valid limit still checks and passes or fails on its merits", () => {
    // M = P L / 4 = 1.5 at midspan (common practice), sigma = M y / I = 1.5.
    const r = checkMember(solution, section, { bendingStress: 2 });
    expect(r.checks).toHaveLength(2);
    expect(r.pass).toBe(true);
    expect(checkMember(solution, section, { bendingStress: 1 }).pass).toBe(false);
  });
});

describe("a utilisation that is not finite is refused", () => {
  it("an allowable so small that demand / capacity overflows gives result-not-finite, not a silent Infinity", () => {
    expect(codes({ bendingStress: 1e-320 })).toEqual(["result-not-finite"]);
    expect(paths({ bendingStress: 1e-320 })).toEqual(["limits.bendingStress"]);
  });
  it("checkResult refuses a demand and capacity whose ratio is not finite", () => {
    expect(() => checkResult("shear-stress", "shear", 1e300, 1e-300, { x: 0 }, "tau")).toThrowError(/result-not-finite/);
    expect(checkResult("shear-stress", "shear", 60, 100, { x: 0 }, "tau").utilisation).toBeCloseTo(0.6, 15);
  });
});
