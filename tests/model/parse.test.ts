import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { formatPath, isFlexuraError } from "../../src/errors/index.js";
import { modelToJson, parseModel, tryParseModel } from "../../src/model/index.js";
import { structurallyValidModel } from "./arbitraries.js";
import { physicalMember, specExample, writeMember, writeMemberWithUnits } from "./sound-models.js";


function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    Object.values(value).forEach(deepFreeze);
    Object.freeze(value);
  }
  return value;
}

function problems(json: unknown): string[] {
  const r = tryParseModel(json);
  return r.ok ? [] : r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}] ${i.message}`);
}

describe("parseModel", () => {
  it("parseModel(the specification's example) converts every quantity to the model's units", () => {
    const model = parseModel(deepFreeze(structuredClone(specExample)));
    expect(model.format).toBe(1);
    expect(model.length).toBe(9);
    // 1 GPa = 1000 MPa; 1 kN/m stays kN/m; mm stays mm (SI prefixes, NIST SP 811 (2008) section 4.3).
    expect(model.E).toBe(200000);
    expect(model.I).toBe(120000000);
    expect(model.supports).toEqual([
      { kind: "pin", at: 0 },
      { kind: "spring", at: 4, stiffness: 5000 },
      { kind: "roller", at: 7.5, settlement: 5 },
    ]);
    expect(model.loads).toEqual([
      { kind: "point", at: 2, value: 18, case: "dead" },
      { kind: "couple", at: 9, value: 4 },
      { kind: "distributed", from: 0, to: 9, start: 3, end: 5, case: "live" },
    ]);
    expect(model.limits).toEqual({ deflection: { kind: "ratio", ratio: 360 }, bendingStress: 165, shearStress: 95 });
    expect(model.units).toEqual({
      length: "m",
      force: "kN",
      moment: "kN*m",
      forcePerLength: "kN/m",
      deflection: "mm",
      rotation: "rad",
      stress: "MPa",
      modulus: "MPa",
      sectionLength: "mm",
      area: "mm^2",
      secondMoment: "mm^4",
      sectionModulus: "mm^3",
      translationalStiffness: "kN/m",
      rotationalStiffness: "kN*m/rad",
    });
  });

  it("parseModel(US units) converts strings with other units exactly", () => {
    const model = parseModel({
      units: { system: "usKipFoot" },
      length: "6 m",
      E: "200 GPa",
      I: 300,
      supports: [{ at: 0, type: "fixed" }],
      loads: [{ type: "point", at: "72 in", value: "10 kN" }],
    });
    // NIST SP 811 (2008) Appendix B.9: 1 ft = 0.3048 m exactly; 1 in = 0.0254 m exactly.
    expect(model.length).toBeCloseTo(6 / 0.3048, 12);
    expect(model.loads[0]).toMatchObject({ at: 6 });
    // NIST SP 811 (2008) Appendix B.9: 1 lbf = 4.448 222 N, so 1 kip = 4.448 222 kN; 1 ksi = 6.894 757 MPa.
    expect((model.loads[0] as { value: number }).value).toBeCloseTo(10 / 4.448222, 5);
    expect(model.E).toBeCloseTo(200000 / 6.894757, 2);
    expect(model.units.moment).toBe("kip*ft");
    expect(model.units.sectionLength).toBe("in");
  });

  it("parseModel fills in distributed-load defaults: from 0, to the length, end = start", () => {
    const model = parseModel({ length: 5, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }], loads: [{ type: "distributed", start: 2 }] });
    expect(model.loads).toEqual([{ kind: "distributed", from: 0, to: 5, start: 2, end: 2 }]);
    expect(model.hinges).toEqual([]);
    expect(model.limits).toEqual({});
  });

  it("parseModel of a model with three errors reports all three, with paths and plain messages", () => {
    const broken = {
      length: 6,
      E: "200 GPa",
      I: "8.5e7 mm^4",
      supports: [{ at: 0, type: "pinned" }, { at: 6, type: "roller" }],
      loads: [
        { type: "point", at: 3, value: "12 kN" },
        { type: "point", at: 7.5, value: 4 },
        { type: "distributed", start: "3 kN" },
      ],
    };
    expect(problems(broken)).toMatchInlineSnapshot(`
      [
        "supports[0].type [not-an-option] Expected one of "pin", "roller", "fixed", "guided", "spring"; got "pinned".",
        "loads[1].at [load-outside-member] The load at 7.5 m is outside the member, which runs from 0 to 6 m.",
        "loads[2].start [wrong-dimension] "3 kN" is a force, but a force per length is due here; use a unit such as kN/m, N/mm, kip/ft or lbf/in.",
      ]
    `);
  });

  it("parseModel reports misspelt fields with a suggestion, and wrong types", () => {
    expect(problems({ lenght: 6, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }], loads: [{ type: "point", at: true, value: 1 }] })).toMatchInlineSnapshot(`
      [
        "length [missing-field] Missing "length": a flexura model needs it.",
        "loads[0].at [wrong-type] Expected a number in the model's length unit or a string with a unit, such as "3.5 m"; got true.",
        "lenght [unknown-field] Unknown field "lenght" in a flexura model. Did you mean "length"?",
      ]
    `);
  });

  it("parseModel checks the source of stiffness", () => {
    const base = { length: 4, supports: [{ at: 0, type: "fixed" }] };
    expect(problems({ ...base, E: 1 }).map((p) => p.split(" ")[1])).toEqual(["[stiffness-missing]"]);
    expect(problems({ ...base, I: 1 }).map((p) => p.split(" ")[1])).toEqual(["[modulus-missing]"]);
    expect(problems({ ...base, E: 1, I: 1, segments: [{ from: 0, to: 4, I: 2 }] }).map((p) => p.split(" ")[1])).toEqual(["[stiffness-given-twice]"]);
    expect(problems({ ...base, E: 1, I: 1, material: { E: 2 } }).map((p) => p.split(" ")[1])).toEqual(["[stiffness-given-twice]"]);
    expect(problems({ ...base, segments: [{ from: 0, to: 4, I: 2 }] }).map((p) => p.split(" ")[1])).toEqual(["[modulus-missing]"]);
    expect(problems({ ...base, segments: [{ from: 0, to: 4, I: 2, E: 3 }] })).toEqual([]);
    expect(problems({ ...base, section: { shape: "rectangle", width: 90, depth: 240 }, material: { E: "11 GPa" } })).toEqual([]);
  });

  it("parseModel reads deflection limits as a fraction of the span or as a length", () => {
    const base = { length: 4, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }] };
    expect(parseModel({ ...base, limits: { deflection: "L/240" } }).limits.deflection).toEqual({ kind: "ratio", ratio: 240 });
    expect(parseModel({ ...base, limits: { deflection: "0.75 in" } }).limits.deflection).toEqual({ kind: "length", value: 19.05 });
    expect(parseModel({ ...base, limits: { deflection: 12 } }).limits.deflection).toEqual({ kind: "length", value: 12 });
    expect(problems({ ...base, limits: { deflection: "half the span" } })).toMatchInlineSnapshot(`
      [
        "limits.deflection [deflection-limit-syntax] Write the deflection limit as a fraction of the span such as "span/360", or as a length such as "20 mm"; got "half the span".",
      ]
    `);
    expect(problems({ ...base, limits: { deflection: "span/0", bendingStress: -3 } }).map((p) => p.split(" ")[1])).toEqual(["[value-not-positive]", "[value-not-positive]"]);
  });

  it("parseModel reports bad units once, where they were given", () => {
    expect(problems({ units: { force: "kipz", length: "kN" }, length: 4, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }] })).toMatchInlineSnapshot(`
      [
        "units.length [wrong-dimension] The unit "kN" cannot measure length; use a unit such as "m".",
        "units.force [unknown-unit] Unknown unit "kipz". Did you mean "kip"?",
      ]
    `);
  });

  it("parseModel reports positions off the member and hinges at its ends", () => {
    const r = problems({
      length: 4,
      E: 1,
      I: 1,
      supports: [{ at: -1, type: "pin" }, { at: 4, type: "spring", stiffness: -2 }],
      hinges: [0, 2],
      loads: [{ type: "distributed", from: 3, to: 1, start: 1 }],
    });
    expect(r.map((p) => p.split(" ").slice(0, 2).join(" "))).toEqual([
      "supports[0].at [support-outside-member]",
      "supports[1].stiffness [value-negative]",
      "hinges[0] [hinge-outside-member]",
      "loads[0].to [load-range-empty]",
    ]);
  });

  it("parseModel refuses input that is not an object, and a newer format", () => {
    expect(problems(null)).toEqual(["(input) [wrong-type] Expected a flexura model; got null."]);
    expect(problems([1])[0]).toContain("[wrong-type]");
    expect(problems({ format: 2, length: 1, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }] })[0]).toContain("[unsupported-format]");
    const r = tryParseModel("{}");
    expect(!r.ok && isFlexuraError(r.error)).toBe(true);
  });
});

describe("modelToJson", () => {
  test.prop([structurallyValidModel], { numRuns: 150 })("a parsed model survives JSON text and modelToJson round trips", (file) => {
    const first = tryParseModel(file);
    const again = tryParseModel(JSON.parse(JSON.stringify(file)));
    expect(again.ok).toBe(first.ok);
    if (!first.ok || !again.ok) return;
    expect(again.value).toEqual(first.value);
    expect(parseModel(JSON.parse(JSON.stringify(modelToJson(first.value))))).toEqual(first.value);
  });

  it("writes a couple as a JSON moment load and a ratio limit as span/N", () => {
    const json = modelToJson(parseModel(specExample));
    expect(json.loads?.[1]).toEqual({ type: "moment", at: 9, value: 4 });
    expect(json.limits?.deflection).toBe("span/360");
  });

  test.prop([physicalMember, fc.constantFrom("siKilonewtonMetre", "usKipFoot", "siNewtonMillimetre" as const)], { numRuns: 100 })(
    "sound models, plain or with units on every number, survive the round trips",
    (member, system) => {
      for (const file of [writeMember(member, system), writeMemberWithUnits(member)]) {
        const model = parseModel(file);
        expect(parseModel(JSON.parse(JSON.stringify(file)))).toEqual(model);
        expect(parseModel(JSON.parse(JSON.stringify(modelToJson(model))))).toEqual(model);
      }
    },
  );
});
