// Bad requests for influence lines: typed errors with stable codes and paths, never a TypeError or NaN.
import { describe, expect, it } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import { influenceLine, memberInfluence, tryInfluenceLine, tryMemberInfluence, type InfluenceQuantity } from "../../src/moving/index.js";

const beam = {
  length: 10,
  stiffness: 1e4,
  supports: [{ kind: "pin" as const, at: 0 }, { kind: "guided" as const, at: 4 }, { kind: "roller" as const, at: 10 }],
  hinges: [6],
};
const member = memberInfluence(beam);
const codes = (q: unknown): unknown => {
  const r = tryInfluenceLine(member, q as InfluenceQuantity);
  return r.ok ? "ok" : r.error.issues.map((i) => `${i.code} at ${JSON.stringify(i.path)}`);
};

describe("influenceLine refuses what it cannot answer", () => {
  it("points outside the member, not numbers, unknown results and sides", () => {
    expect(codes({ kind: "moment", at: 10.5 })).toMatchInlineSnapshot(`
      [
        "influence-point-outside-member at ["at"]",
      ]
    `);
    expect(codes({ kind: "deflection", at: -1 })).toMatchInlineSnapshot(`
      [
        "influence-point-outside-member at ["at"]",
      ]
    `);
    expect(codes({ kind: "slope", at: Number.NaN })).toMatchInlineSnapshot(`
      [
        "not-finite at ["at"]",
      ]
    `);
    expect(codes({ kind: "moment", at: "3" })).toMatchInlineSnapshot(`
      [
        "not-a-number at ["at"]",
      ]
    `);
    expect(codes({ kind: "torque", at: 3 })).toMatchInlineSnapshot(`
      [
        "influence-quantity-invalid at ["kind"]",
      ]
    `);
    expect(codes(null)).toMatchInlineSnapshot(`
      [
        "influence-quantity-invalid at []",
      ]
    `);
    expect(codes({ kind: "shear", at: 3 })).toMatchInlineSnapshot(`
      [
        "influence-side-invalid at ["side"]",
      ]
    `);
  });
  it("results with no meaning where they are asked for", () => {
    expect(codes({ kind: "shear", at: 0, side: "left" })).toMatchInlineSnapshot(`
      [
        "influence-undefined at ["side"]",
      ]
    `);
    expect(codes({ kind: "shear", at: 10, side: "right" })).toMatchInlineSnapshot(`
      [
        "influence-undefined at ["side"]",
      ]
    `);
    expect(codes({ kind: "slope", at: 6 })).toMatchInlineSnapshot(`
      [
        "influence-undefined at ["at"]",
      ]
    `);
    expect(codes({ kind: "moment", at: 4 })).toMatchInlineSnapshot(`
      [
        "influence-side-required at ["side"]",
      ]
    `);
    expect(codes({ kind: "reaction", support: 1 })).toMatchInlineSnapshot(`
      [
        "influence-undefined at ["component"]",
      ]
    `);
    expect(codes({ kind: "reaction", support: 0, component: "moment" })).toMatchInlineSnapshot(`
      [
        "influence-undefined at ["component"]",
      ]
    `);
    expect(codes({ kind: "reaction", support: 3 })).toMatchInlineSnapshot(`
      [
        "influence-support-unknown at ["support"]",
      ]
    `);
    expect(codes({ kind: "reaction", support: 0, component: "torque" })).toMatchInlineSnapshot(`
      [
        "influence-quantity-invalid at ["component"]",
      ]
    `);
    // either side of the guided support is fine, and so are the moment at a hinge and the ends' shears
    expect(codes({ kind: "moment", at: 4, side: "left" })).toBe("ok");
    expect(codes({ kind: "moment", at: 6 })).toBe("ok");
    expect(codes({ kind: "shear", at: 10, side: "left" })).toBe("ok");
  });
  it("a member that cannot stand is refused with the beam engine's own codes and paths", () => {
    const r = tryMemberInfluence({ length: 4, stiffness: 1, supports: [{ kind: "roller", at: 0 }] });
    expect(r.ok ? [] : r.error.issues.map((i) => i.code)).toEqual(["mechanism"]);
    const bad = tryMemberInfluence(null as never);
    expect(bad.ok ? "" : bad.error.issues[0]?.code).toBe("beam-invalid");
    const e = (() => {
      try {
        influenceLine({ length: -2, stiffness: 1, supports: [] }, { kind: "moment", at: 1 });
      } catch (x) {
        return x;
      }
      return undefined;
    })();
    expect(isFlexuraError(e)).toBe(true);
  });
  it("does not change its input", () => {
    const input = structuredClone({ ...beam, loads: [{ kind: "point" as const, at: 2, value: 5 }], supports: [{ kind: "pin" as const, at: 0, settlement: 0.01 }, ...beam.supports.slice(1)] });
    const copy = structuredClone(input);
    memberInfluence(input);
    expect(input).toEqual(copy);
  });
});
