import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  builtUp,
  circle,
  rectangle,
  rectangularHollow,
  translateSection,
  tryCentreLineModel,
  tryClosedSectionTorsion,
  tryFullyPlasticMoments,
  tryOpenSectionProperties,
  tryPrincipalAxisProperties,
  tryTorsionConstantExact,
  tryTorsionConstantRolledI,
  tryTorsionConstantRolledTee,
  type WallModel,
} from "../../src/section/index.js";

const codes = (r: { ok: boolean; error?: unknown }): string[] => {
  expect(r.ok).toBe(false);
  expect(isFlexuraError(r.error)).toBe(true);
  return (r.error as { issues: { code: string }[] }).issues.map((i) => i.code);
};
const wm = (plates: unknown): WallModel => ({ kind: "wall-model", plates }) as unknown as WallModel;

describe("stability properties refuse what their formulas do not cover", () => {
  it("centreLineModel refuses holes, round parts and stocky plates, with paths", () => {
    expect(codes(tryCentreLineModel(rectangularHollow({ width: 100, depth: 200, wallThickness: 8 })))).toContain("centre-line-hole");
    expect(codes(tryCentreLineModel(circle({ diameter: 50 })))).toEqual(["centre-line-part-not-plate"]);
    const r = tryCentreLineModel(rectangle({ width: 30, depth: 20 }));
    expect(codes(r)).toEqual(["centre-line-plate-not-thin"]);
    expect(r.ok ? null : r.error.issues[0]).toMatchInlineSnapshot(`
      {
        "code": "centre-line-plate-not-thin",
        "length": 30,
        "message": "The plate is 30 long and 20 thick: the thin-walled model needs plates at least 2 times as long as they are thick.",
        "path": [
          "parts",
          0,
        ],
        "thickness": 20,
      }
    `);
  });

  it("openSectionProperties refuses separate plates, closed cells and a section on one line", () => {
    const apart = builtUp([rectangle({ width: 100, depth: 10 }), translateSection(rectangle({ width: 100, depth: 10 }), { y: 50, z: 0 })]);
    expect(codes(tryOpenSectionProperties(apart))).toEqual(["walls-not-connected"]);
    const box = wm([
      { start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 5 },
      { start: { y: 0, z: 100 }, end: { y: 100, z: 100 }, thickness: 5 },
      { start: { y: 100, z: 100 }, end: { y: 0, z: 0 }, thickness: 5 },
    ]);
    expect(codes(tryOpenSectionProperties(box))).toEqual(["open-section-has-cell"]);
    expect(codes(tryOpenSectionProperties(wm([{ start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 5 }])))).toEqual(["open-section-is-line"]);
  });

  it("wall models: bad plates are all reported, each with its path", () => {
    const r = tryOpenSectionProperties(wm([{ start: { y: 0, z: 0 }, end: { y: 0, z: 0 }, thickness: 5 }, { start: { y: Number.NaN, z: 0 }, end: { y: 1, z: 0 }, thickness: -1 }, 7]));
    expect(codes(r)).toEqual(["not-finite", "wall-thickness-negative", "wall-model-invalid"]);
    expect(codes(tryClosedSectionTorsion(wm([])))).toEqual(["wall-model-invalid"]);
    expect(codes(tryClosedSectionTorsion(wm([{ start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 0 }])))).toEqual(["wall-model-no-area"]);
    expect(codes(tryClosedSectionTorsion(wm([{ start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 5 }])))).toEqual(["closed-section-no-cell"]);
    const linked = wm([
      { start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 5 },
      { start: { y: 0, z: 100 }, end: { y: 100, z: 100 }, thickness: 0 },
      { start: { y: 100, z: 100 }, end: { y: 0, z: 0 }, thickness: 5 },
    ]);
    expect(codes(tryClosedSectionTorsion(linked))).toEqual(["closed-section-link-in-cell"]);
  });

  it("exact and rolled torsion constants name the formula that applies instead", () => {
    expect(codes(tryTorsionConstantExact(rectangularHollow({ width: 100, depth: 200, wallThickness: 8 })))).toEqual(["torsion-exact-not-available"]);
    expect(codes(tryTorsionConstantRolledI({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 }))).toEqual(["torsion-rolled-needs-root-radius"]);
    expect(codes(tryTorsionConstantRolledI({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6, rootRadius: 10, bottomFlangeWidth: 120 }))).toEqual(["torsion-rolled-unequal-flanges"]);
    expect(codes(tryTorsionConstantRolledTee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 }))).toEqual(["torsion-rolled-needs-root-radius"]);
    expect(codes(tryTorsionConstantRolledI({ depth: -1, flangeWidth: 150, flangeThickness: 10, webThickness: 6, rootRadius: 10 }))).toEqual(["dimension-not-positive"]);
  });

  it("fullyPlasticMoments needs every solid part's yield strength", () => {
    const r = tryFullyPlasticMoments(builtUp([rectangle({ width: 100, depth: 10 }, { material: { elasticModulus: 2e5, yieldStrength: 300 } }), translateSection(rectangle({ width: 100, depth: 10 }, { material: { elasticModulus: 2e5 } }), { y: 10, z: 0 })]));
    expect(codes(r)).toEqual(["yield-strength-missing"]);
    expect(r.ok ? null : r.error.issues[0]?.path).toEqual(["parts", 1, "material", "yieldStrength"]);
  });

  test.prop([fc.anything()], { numRuns: 300 })("any input gives a result or a FlexuraError, never another exception", (junk) => {
    for (const f of [tryCentreLineModel, tryOpenSectionProperties, tryClosedSectionTorsion, tryTorsionConstantExact, tryPrincipalAxisProperties, tryFullyPlasticMoments, tryTorsionConstantRolledI, tryTorsionConstantRolledTee] as ((x: unknown) => { ok: boolean; error?: unknown })[]) {
      const r = f(junk);
      if (!r.ok) expect(isFlexuraError(r.error)).toBe(true);
    }
    const r = tryOpenSectionProperties(wm(junk));
    if (!r.ok) expect(isFlexuraError(r.error)).toBe(true);
  });
});
