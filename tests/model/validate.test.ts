import { describe, expect, it } from "vitest";
import { formatPath } from "../../src/errors/index.js";
import { structuralIssues } from "../../src/model/validate.js";

const list = (json: unknown): string[] => structuralIssues(json).map((i) => `${formatPath(i.path)} [${i.code}] ${i.message}`);
const base = { length: 4, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }] };

describe("structuralIssues", () => {
  it("asks a spring for at least one stiffness, and refuses fields that do not apply", () => {
    expect(list({ ...base, supports: [{ at: 0, type: "spring" }, { at: 1, type: "roller", rotation: 0.01, rotationalStiffness: 5 }] })).toMatchInlineSnapshot(`
      [
        "supports[0] [missing-field] Give "stiffness" or "rotationalStiffness" (or both) for type "spring".",
        "supports[1].rotationalStiffness [field-not-allowed] The field "rotationalStiffness" does not apply for type "roller"; remove it.",
        "supports[1].rotation [field-not-allowed] The field "rotation" does not apply for type "roller"; remove it.",
      ]
    `);
  });

  it("reports empty strings, empty lists, NaN, and unknown names without a close match", () => {
    expect(list({ ...base, units: { length: "" }, supports: [], hinges: [Number.NaN], zebra: 1 })).toMatchInlineSnapshot(`
      [
        "units.length [empty-string] "length" must not be empty.",
        "supports [too-few-items] Give at least 1 item in "supports".",
        "hinges[0] [not-finite] Expected a finite number; got NaN.",
        "zebra [unknown-field] Unknown field "zebra" in a flexura model.",
      ]
    `);
  });

  it("checks the dimensions a section shape needs", () => {
    expect(list({ ...base, section: { shape: "tee", depth: 200, flangeWidth: 100, flangeThickness: 10, webThickness: 8, radius: 3 } })).toMatchInlineSnapshot(`
      [
        "section.radius [unknown-field] Unknown field "radius" in the tee section.",
      ]
    `);
    expect(list({ ...base, section: { shape: "hexagon" } })).toMatchInlineSnapshot(`
      [
        "section.shape [not-an-option] Expected one of "rectangle", "circle", "pipe", "i-section", "tee", "channel", "angle", "rectangular-hollow", "plate-girder", "built-up"; got "hexagon".",
      ]
    `);
  });

  it("accepts a model with every optional field", () => {
    expect(
      list({
        $schema: "./schema.json",
        format: 1,
        name: "n",
        description: "d",
        units: { system: "usKipInch", length: "ft" },
        length: 4,
        segments: [{ from: 0, to: 4, E: 1, I: 1 }],
        section: { shape: "i-section", depth: 10, flangeWidth: 5, flangeThickness: 1, webThickness: 1, bottomFlangeWidth: 6, bottomFlangeThickness: 1 },
        material: { name: "steel", E: 29000, yieldStrength: 50 },
        supports: [{ at: 0, type: "fixed", rotation: 0, settlement: 0 }, { at: 4, type: "spring", stiffness: 3, rotationalStiffness: 4 }],
        hinges: [2],
        loads: [{ type: "distributed", from: 0, to: 4, start: 1, end: 2, case: "snow" }],
        limits: { deflection: "span/240", bendingStress: 30, shearStress: 20 },
      }),
    ).toEqual([]);
  });
});
