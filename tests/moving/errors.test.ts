// Bad requests for influence lines: typed errors with stable codes and paths, never a TypeError or NaN.
import { describe, expect, it } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import { solveBeam } from "../../src/beam/index.js";
import {
  envelopeAt,
  influenceLine,
  memberInfluence,
  movingEnvelopes,
  tryAbsoluteMoments,
  tryInfluenceLine,
  tryMemberInfluence,
  tryMovingDeflections,
  tryWithFixedDiagram,
  tryWorstPlacements,
  worstPlacements,
  type InfluenceQuantity,
  type MovingDeflectionLimit,
  type Train,
  type TrainOptions,
} from "../../src/moving/index.js";

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

describe("trains and their options are checked, every problem at once", () => {
  const simple = { length: 8, stiffness: 1e4, supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: 8 }] };
  const codesOf = (train: unknown, options?: unknown): unknown => {
    const r = tryWorstPlacements(simple, { kind: "moment", at: 4 }, train as Train, options as TrainOptions);
    return r.ok ? "ok" : r.error.issues.map((i) => `${i.code} at ${JSON.stringify(i.path)}`);
  };
  it("negative, non-finite and missing spacings, bad loads, an empty train", () => {
    expect(codesOf({ loads: [10, 10, 5], spacings: [-1, Number.POSITIVE_INFINITY] })).toMatchInlineSnapshot(`
      [
        "spacing-negative at ["train","spacings",0]",
        "not-finite at ["train","spacings",1]",
      ]
    `);
    expect(codesOf({ loads: [10, "5"], spacings: [] })).toMatchInlineSnapshot(`
      [
        "train-spacings-count at ["train","spacings"]",
        "not-a-number at ["train","loads",1]",
      ]
    `);
    expect(codesOf({ loads: [], spacings: [] })).toMatchInlineSnapshot(`
      [
        "train-empty at ["train","loads"]",
      ]
    `);
    expect(codesOf(null)).toMatchInlineSnapshot(`
      [
        "train-invalid at ["train"]",
      ]
    `);
    expect(codesOf({ loads: 3, spacings: [] })).toMatchInlineSnapshot(`
      [
        "train-invalid at ["train","loads"]",
      ]
    `);
    expect(codesOf({ loads: [1], spacings: [], uniform: { intensity: 2, start: 0, length: 0 } })).toMatchInlineSnapshot(`
      [
        "uniform-length-not-positive at ["train","uniform","length"]",
      ]
    `);
    expect(codesOf({ loads: [1], spacings: [], uniform: 4 })).toMatchInlineSnapshot(`
      [
        "train-invalid at ["train","uniform"]",
      ]
    `);
  });
  it("options: dynamic allowance, partlyOn, directions; a train longer than the member when it must stand wholly on it", () => {
    expect(codesOf({ loads: [1], spacings: [] }, { dynamic: "gantry", partlyOn: "yes", directions: "up" })).toMatchInlineSnapshot(`
      [
        "dynamic-allowance-unknown at ["options","dynamic"]",
        "train-options-invalid at ["options","partlyOn"]",
        "train-options-invalid at ["options","directions"]",
      ]
    `);
    expect(codesOf({ loads: [1], spacings: [] }, { dynamic: -0.1 })).toMatchInlineSnapshot(`
      [
        "dynamic-allowance-negative at ["options","dynamic"]",
      ]
    `);
    expect(codesOf({ loads: [1], spacings: [] }, 3)).toMatchInlineSnapshot(`
      [
        "train-options-invalid at ["options"]",
      ]
    `);
    expect(codesOf({ loads: [1, 1], spacings: [9] }, { partlyOn: false })).toMatchInlineSnapshot(`
      [
        "train-longer-than-member at ["train"]",
      ]
    `);
    expect(codesOf({ loads: [1, 1], spacings: [9] })).toBe("ok");
    // exactly as long as the member, wholly on it: one placement
    const one = worstPlacements(simple, { kind: "reaction", support: 0 }, { loads: [3, 5], spacings: [8] }, { partlyOn: false });
    expect(one.max.value).toBeCloseTo(5, 12); // turned round, the 5 over the left support
    expect(worstPlacements(simple, { kind: "reaction", support: 0 }, { loads: [3, 5], spacings: [8] }, { partlyOn: false, directions: "as-given" }).max.value).toBeCloseTo(3, 12);
  });
  it("absolute moments and deflections refuse what they do not cover or are not given", () => {
    const r = tryAbsoluteMoments(simple, { loads: [1], spacings: [], uniform: { intensity: 1, start: 0, length: 2 } });
    expect(r.ok ? "" : r.error.issues[0]?.code).toBe("absolute-moment-uniform-not-covered");
    const d = (limit: unknown, points: unknown = [4]) => {
      const x = tryMovingDeflections(simple, { loads: [1], spacings: [] }, points as number[], limit as MovingDeflectionLimit);
      return x.ok ? "ok" : x.error.issues.map((i) => `${i.code} at ${JSON.stringify(i.path)}`);
    };
    expect(d(undefined)).toEqual(['deflection-limit-missing at ["limit"]']);
    expect(d({ ratio: 0 })).toEqual(['deflection-limit-invalid at ["limit","ratio"]']);
    expect(d({ absolute: Number.NaN })).toEqual(['deflection-limit-invalid at ["limit","absolute"]']);
    expect(d("span/600")).toEqual(['deflection-limit-invalid at ["limit"]']);
    expect(d({ ratio: 600 }, [])).toEqual(['deflection-points-invalid at ["points"]']);
    expect(d({ ratio: 600 }, [2, 9])).toEqual(['influence-point-outside-member at ["points",1]']);
    const at = envelopeAtCodes();
    expect(at).toEqual(['influence-point-outside-member at ["at",0]']);
    function envelopeAtCodes(): unknown {
      try {
        envelopeAt(simple, { loads: [1], spacings: [] }, "moment", [-3]);
        return "ok";
      } catch (e) {
        return isFlexuraError(e) ? e.issues.map((i) => `${i.code} at ${JSON.stringify(i.path)}`) : e;
      }
    }
    const f = tryWithFixedDiagram(movingEnvelopes(simple, { loads: [1], spacings: [] }).moment, solveBeam(simple).moment, Number.NaN);
    expect(f.ok ? "" : f.error.issues[0]?.code).toBe("not-finite");
  });
  it("does not change the train or options it is given", () => {
    const train = { loads: [10, 12], spacings: [2], uniform: { intensity: 1, start: -1, length: 3 } };
    const options = { dynamic: "bridge-pendant" as const, partlyOn: true };
    const copy = structuredClone({ train, options });
    worstPlacements(simple, { kind: "moment", at: 4 }, train, options);
    expect({ train, options }).toEqual(copy);
  });
});
