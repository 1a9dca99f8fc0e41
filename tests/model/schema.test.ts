import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { test } from "@fast-check/vitest";
import { Ajv2020 } from "ajv/dist/2020.js";
import { modelSchema } from "../../src/model/schema.js";
import { structuralIssues } from "../../src/model/validate.js";
import { possiblyInvalidModel, structurallyValidModel } from "./arbitraries.js";
import { specExample } from "./sound-models.js";

// A general-purpose JSON Schema validator (ajv 8, draft 2020-12) is the outside reference for
// what the published schema means. strictRequired is off: the schema names required fields inside
// anyOf branches (a spring needs one of two stiffnesses), which is valid JSON Schema.
const ajv = new Ajv2020({ strict: true, allowUnionTypes: true, strictRequired: false, allErrors: true });
const ajvValidate = ajv.compile(modelSchema);

describe("modelSchema", () => {
  it("the published file schema/flexura-model.schema.json is the schema object (run `npm run schema` after a change)", () => {
    const file = readFileSync(join(import.meta.dirname, "..", "..", "schema", "flexura-model.schema.json"), "utf8");
    expect(file).toBe(`${JSON.stringify(modelSchema, null, 2)}\n`);
  });

  it("is a valid draft 2020-12 schema in ajv's strict mode", () => {
    expect(ajv.validateSchema(modelSchema)).toBe(true);
  });

  it("accepts the example model of the format's specification", () => {
    expect(ajvValidate(specExample)).toBe(true);
    expect(structuralIssues(specExample)).toEqual([]);
  });
});

describe("structuralIssues agrees with a general-purpose JSON Schema validator", () => {
  test.prop([structurallyValidModel], { numRuns: 150 })("on random structurally valid models both accept", (model) => {
    expect(ajvValidate(model)).toBe(true);
    expect(structuralIssues(model)).toEqual([]);
  });

  test.prop([possiblyInvalidModel], { numRuns: 300 })("on random, mostly invalid models both give the same verdict", (model) => {
    const ours = structuralIssues(model);
    expect(ours.length === 0).toBe(ajvValidate(model));
  });
});
