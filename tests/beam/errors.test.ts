import { describe, expect, it } from "vitest";
import { solveBeam, trySolveBeam, type BeamInput } from "../../src/beam/index.js";
import { isFlexuraError } from "../../src/errors/index.js";

/** The codes and paths of the problems reported for a member. */
function problems(beam: unknown, options?: unknown): string[] {
  const r = trySolveBeam(beam as BeamInput, options as never);
  if (r.ok) return [];
  return r.error.issues.map((i) => `${i.code} @ ${i.path.join(".")}`);
}

const simple: BeamInput = { length: 6, stiffness: 1000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }] };

describe("solveBeam(bad input)", () => {
  it("reports every problem at once, with paths", () => {
    expect(
      problems({
        length: 6,
        stiffness: -1,
        supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 0 }, { kind: "slider", at: 2 }],
        loads: [
          { kind: "point", at: 7, value: 1 },
          { kind: "distributed", from: 3, to: 2, start: 1, end: Number.NaN },
          { kind: "gravity" },
          null,
          { kind: "couple", at: -1, value: "3" },
          { kind: "point", at: 1, value: 1, case: 7 },
        ],
      }),
    ).toMatchInlineSnapshot(`
      [
        "stiffness-not-positive @ stiffness",
        "support-kind-unknown @ supports.2.kind",
        "support-duplicate @ supports.1.at",
        "load-outside-member @ loads.0.at",
        "not-finite @ loads.1.end",
        "load-extent-not-positive @ loads.1.to",
        "load-kind-unknown @ loads.2.kind",
        "load-not-an-object @ loads.3",
        "not-a-number @ loads.4.value",
        "load-outside-member @ loads.4.at",
        "load-case-not-a-string @ loads.5.case",
      ]
    `);
  });

  it("zero or negative length, NaN anywhere, and a member that is not an object", () => {
    expect(problems({ ...simple, length: 0 })).toEqual(["length-not-positive @ length"]);
    expect(problems({ ...simple, length: Number.NaN })).toEqual(["not-finite @ length"]);
    expect(problems({ ...simple, supports: [{ kind: "pin", at: Number.NaN }] })).toEqual(["not-finite @ supports.0.at"]);
    expect(problems(null)).toEqual(["beam-not-an-object @ "]);
    expect(problems({ ...simple, supports: "pin" })).toEqual(["not-an-array @ supports"]);
    expect(problems({ length: 6, stiffness: 1 })).toEqual(["not-an-array @ supports"]);
    expect(problems({ ...simple, loads: {} })).toEqual(["not-an-array @ loads"]);
    expect(problems({ ...simple, supports: [3] })).toEqual(["support-not-an-object @ supports.0"]);
  });

  it("loads outside the member name the offending end", () => {
    expect(problems({ ...simple, loads: [{ kind: "distributed", from: -1, to: 8, start: 1, end: 1 }] })).toEqual([
      "load-outside-member @ loads.0.from",
      "load-outside-member @ loads.0.to",
    ]);
    const r = trySolveBeam({ ...simple, loads: [{ kind: "point", at: 7.5, value: 1 }] });
    expect(r.ok || r.error.message).toMatchInlineSnapshot(`"loads[0].at: The point load at x = 7.5 lies off the member, which runs from 0 to 6. [load-outside-member]"`);
  });

  it("stepped stiffness must tile the member", () => {
    expect(problems({ ...simple, stiffness: [] })).toEqual(["stiffness-not-tiling @ stiffness"]);
    expect(
      problems({
        ...simple,
        stiffness: [
          { from: 0, to: 2, stiffness: 1 },
          { from: 2.5, to: 6, stiffness: 0 },
        ],
      }),
    ).toEqual(["stiffness-not-positive @ stiffness.1.stiffness", "stiffness-not-tiling @ stiffness.1.from"]);
    expect(problems({ ...simple, stiffness: [{ from: 0, to: 5, stiffness: 1 }] })).toEqual(["stiffness-not-tiling @ stiffness.0.to"]);
    expect(problems({ ...simple, stiffness: [{ from: 0, to: 0, stiffness: 1 }, 4] })).toEqual([
      "stiffness-not-tiling @ stiffness.0.to",
      "stiffness-not-tiling @ stiffness.1",
    ]);
    expect(problems({ ...simple, stiffness: [{ from: "0", to: 6, stiffness: 1 }] })).toEqual(["not-a-number @ stiffness.0.from"]);
  });

  it("springs need a positive stiffness; rigid supports take none; settlement and rotation only where held", () => {
    expect(
      problems({
        length: 6,
        stiffness: 1,
        supports: [
          { kind: "pin", at: 0, stiffness: 5, rotation: 0.1 },
          { kind: "spring", at: 2 },
          { kind: "spring", at: 3, stiffness: -1, rotationalStiffness: 0 },
          { kind: "guided", at: 4, settlement: 0.1 },
          { kind: "spring", at: 5, rotationalStiffness: 1, settlement: 0.01 },
          { kind: "spring", at: 6, stiffness: 1, rotation: 0.01 },
          { kind: "fixed", at: 1, settlement: Infinity },
        ],
      }),
    ).toMatchInlineSnapshot(`
      [
        "support-field-not-applicable @ supports.0.stiffness",
        "support-field-not-applicable @ supports.0.rotation",
        "spring-without-stiffness @ supports.1",
        "spring-stiffness-not-positive @ supports.2.stiffness",
        "spring-stiffness-not-positive @ supports.2.rotationalStiffness",
        "support-field-not-applicable @ supports.3.settlement",
        "support-field-not-applicable @ supports.4.settlement",
        "support-field-not-applicable @ supports.5.rotation",
        "not-finite @ supports.6.settlement",
      ]
    `);
    expect(problems({ ...simple, supports: [{ kind: "pin", at: 9 }] })).toEqual(["support-outside-member @ supports.0.at"]);
  });

  it("hinges must lie strictly inside the member, once each", () => {
    expect(problems({ ...simple, hinges: [0, 3, 3, 9, "x"] })).toEqual([
      "hinge-at-member-end @ hinges.0",
      "hinge-outside-member @ hinges.3",
      "not-a-number @ hinges.4",
      "hinge-duplicate @ hinges.2",
    ]);
    expect(problems({ ...simple, hinges: 3 })).toEqual(["not-an-array @ hinges"]);
  });

  it("load-case factors must be finite numbers", () => {
    expect(problems(simple, { factors: { live: Number.NaN } })).toEqual(["not-finite @ factors.live"]);
    expect(problems(simple, { factors: 2 })).toEqual(["not-an-object @ factors"]);
  });

  it("an empty load list is valid and gives zero results", () => {
    const s = solveBeam({ ...simple, loads: [] });
    expect(s.reactions.map((r) => r.force)).toEqual([0, 0]);
    expect(s.peaks.moment).toEqual({ max: { value: 0, at: 0 }, min: { value: 0, at: 0 } });
    expect(s.contraflexure).toEqual([]);
    expect(s.residual).toEqual({ force: 0, moment: 0 });
  });
});

describe("solveBeam(mechanism)", () => {
  const mech = (beam: BeamInput) => {
    try {
      solveBeam(beam);
    } catch (e) {
      if (isFlexuraError(e)) {
        const i = e.issues[0]!;
        return { code: i.code, path: i.path.join("."), reason: i["reason"], from: i["from"], to: i["to"], message: i.message };
      }
      throw e;
    }
    return undefined;
  };

  it("no supports", () => {
    expect(mech({ length: 4, stiffness: 1, supports: [] })).toMatchInlineSnapshot(`
      {
        "code": "mechanism",
        "from": 0,
        "message": "The member has no supports and would move freely: add a pin and a roller, or one fixed support.",
        "path": "supports",
        "reason": "no-supports",
        "to": 4,
      }
    `);
  });

  it("all rollers: nothing holds the member along its axis, which bending does not need: solved, with a warning", () => {
    expect(mech({ length: 4, stiffness: 1, supports: [{ kind: "roller", at: 0 }, { kind: "roller", at: 4 }] })).toBeUndefined();
    const s = solveBeam({ length: 4, stiffness: 1, supports: [{ kind: "roller", at: 0 }, { kind: "roller", at: 4 }] });
    expect(s.warnings.map((w) => w.code)).toEqual(["no-horizontal-restraint"]);
  });

  it("all rollers with a hinge over nothing: the hinge mechanism is reported, not the missing axial restraint", () => {
    expect(mech({ length: 4, stiffness: 1, hinges: [2], supports: [{ kind: "roller", at: 0 }, { kind: "roller", at: 4 }] })).toMatchObject({ code: "mechanism", reason: "hinge", path: "hinges.0" });
  });

  it("guided supports only: nothing holds deflection", () => {
    expect(mech({ length: 4, stiffness: 1, supports: [{ kind: "guided", at: 0 }] })?.reason).toBe("no-deflection-restraint");
  });

  it("one pin and no rotational restraint: the member turns about the pin", () => {
    expect(mech({ length: 4, stiffness: 1, supports: [{ kind: "pin", at: 1 }] })).toMatchObject({ code: "mechanism", reason: "free-to-rotate" });
  });

  it("a hinge over nothing in a simple span", () => {
    expect(mech({ length: 4, stiffness: 1, hinges: [2], supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }] })).toMatchInlineSnapshot(`
      {
        "code": "mechanism",
        "from": 0,
        "message": "The part between x = 0 and x = 4 can move, turning at its hinges: add a support to it, or remove a hinge.",
        "path": "hinges.0",
        "reason": "hinge",
        "to": 4,
      }
    `);
  });

  it("a cantilever with a hinge and nothing beyond it", () => {
    expect(mech({ length: 4, stiffness: 1, hinges: [3], supports: [{ kind: "fixed", at: 0 }] })).toMatchObject({ reason: "hinge", from: 3, to: 4, path: "hinges.0" });
  });

  it("two hinges in one span with a support on only one side", () => {
    expect(
      mech({ length: 9, stiffness: 1, hinges: [6, 3], supports: [{ kind: "fixed", at: 0 }, { kind: "roller", at: 9 }] }),
    ).toMatchObject({ reason: "hinge", from: 3, to: 9, path: "hinges.0" });
    expect(
      mech({ length: 9, stiffness: 1, hinges: [3, 6], supports: [{ kind: "fixed", at: 0 }, { kind: "roller", at: 4.5 }] }),
    ).toMatchObject({ reason: "hinge", from: 6, to: 9, path: "hinges.1" });
  });

  it("stable hinged members solve: a hinge over a support, and a hinge next to a fixed end", () => {
    expect(mech({ length: 8, stiffness: 1, hinges: [4], supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }, { kind: "roller", at: 8 }] })).toBeUndefined();
    expect(mech({ length: 8, stiffness: 1, hinges: [4], supports: [{ kind: "fixed", at: 0 }, { kind: "spring", at: 8, stiffness: 10 }] })).toBeUndefined();
    expect(mech({ length: 8, stiffness: 1, hinges: [4], supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }, { kind: "fixed", at: 8 }] })).toBeUndefined();
    expect(mech({ length: 8, stiffness: 1, hinges: [4], supports: [{ kind: "pin", at: 0 }, { kind: "fixed", at: 4 }] })?.code).toBe("hinge-at-rotational-support");
  });
});
