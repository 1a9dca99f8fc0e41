// Cases, combinations and check groups in model files. Published values are cited beside each
// check; the loads and limits are invented.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkLoadCombinations, memberSection } from "../../src/check/index.js";
import { envelopes, presetCombinations, solveCases } from "../../src/combine/index.js";
import { analysisToJson, analyzeModel, modelToJson, parseModel, tryAnalyzeModel, tryParseModel } from "../../src/model/index.js";
import { rectangle } from "../../src/section/index.js";

const L = 6;
const wD = 3;
const wL = 5;
const twoSpans = {
  units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
  length: 2 * L,
  E: "200 GPa",
  I: "8e7 mm^4",
  supports: [{ at: 0, type: "pin" }, { at: L, type: "roller" }, { at: 2 * L, type: "roller" }],
  cases: [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }],
  loads: [
    { type: "distributed", start: wD, case: "D" },
    { type: "distributed", start: wL, case: "L" },
  ],
  combinations: [{ preset: "asce7-16-strength" }],
};

describe("analyzeModel with cases and a preset (two equal spans, patterned live)", () => {
  const a = analyzeModel(parseModel(twoSpans));
  const c = a.combinations!;

  it("lists every combination applied, with its clause", () => {
    expect(c.combinations.map((x) => x.name)).toEqual(presetCombinations("asce7-16-strength", twoSpans.cases as never).combinations.map((x) => x.name));
    expect(c.combinations.every((x) => x.clause?.startsWith("ASCE 7-16 2.3"))).toBe(true);
    expect(c.notes.some((n) => n.includes("seismic"))).toBe(true);
  });

  it("envelopes the support moment at -(1.2 wD + 1.6 wL) L^2 / 8 with live on both spans", () => {
    // two equal spans, uniform load on both: M_B = -w L^2 / 8 (AISC Steel Construction Manual, Table 3-23, case 29)
    const low = c.envelopes!.moment.lower.peak;
    expect(low.value).toBeCloseTo((-(1.2 * wD + 1.6 * wL) * L * L) / 8, 9);
    expect(low.at).toBeCloseTo(L, 9);
    expect(low.combination).toBe("1.2D + 1.6L, L on all spans");
  });

  it("envelopes the span moment of patterned live alone at 0.0957 w L^2, with one span loaded", () => {
    // two equal spans, uniform load on one span: M_max = 0.0957 w L^2 (AISC Steel Construction Manual, Table 3-23, case 30; the issue's figure)
    const live = analyzeModel(parseModel({ ...twoSpans, combinations: [{ name: "live", purpose: "strength", factors: { L: 1 } }] })).combinations!;
    const up = live.envelopes!.moment.upper.peak;
    expect(Math.abs(up.value / (wL * L * L) - 0.0957)).toBeLessThanOrEqual(0.00005);
    expect(["live, L on span 1", "live, L on span 2"]).toContain(up.combination);
    // and the combination with both spans loaded governs the support: -w L^2 / 8 (case 29)
    expect(live.envelopes!.moment.lower.peak.value).toBeCloseTo((-wL * L * L) / 8, 9);
  });

  it("gives the typed API's envelopes and reaction envelopes, in the model's units", () => {
    const beam = { length: 2 * L, stiffness: 200e9 * 8e-5, supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: L }, { kind: "roller" as const, at: 2 * L }], loads: [{ kind: "distributed" as const, from: 0, to: 2 * L, start: wD * 1000, end: wD * 1000, case: "D" }, { kind: "distributed" as const, from: 0, to: 2 * L, start: wL * 1000, end: wL * 1000, case: "L" }] };
    const solved = solveCases(beam, twoSpans.cases as never);
    const e = envelopes(solved, presetCombinations("asce7-16-strength", solved.cases).combinations);
    expect(c.arrangements).toBe(e.arrangements.length);
    expect(c.envelopes!.shear.upper.peak.value).toBeCloseTo(e.shear!.upper.peak.value / 1000, 9);
    expect(c.envelopes!.deflection.lower.peak.value).toBeCloseTo(e.deflection!.lower.peak.value * 1000, 9);
    expect(c.reactions![1]!.force.max.value).toBeCloseTo(e.reactions[1]!.force.max.value / 1000, 9);
    expect(c.reactions![1]!.force.max.combination).toBe(e.reactions[1]!.force.max.name);
    expect(c.envelopes!.moment.upper.governing).toHaveLength(c.envelopes!.moment.upper.diagram.pieces.length);
  });

  it("carries the combinations in the JSON form, and the model round-trips", () => {
    const json = analysisToJson(a);
    expect(json.combinations?.envelopes?.moment.lower.peak.combination).toBe("1.2D + 1.6L, L on all spans");
    expect(parseModel(JSON.parse(JSON.stringify(modelToJson(a.model))))).toEqual(a.model);
  });
});

describe("analyzeModel with check groups and self-weight", () => {
  const file = {
    ...twoSpans,
    section: { shape: "rectangle", width: 200, depth: 400 },
    material: { E: "12 GPa" },
    E: undefined,
    I: undefined,
    selfWeight: { case: "SW", unitWeight: "25 kN/m^3" },
    combinations: [{ preset: "asce7-16-allowable-stress", options: { map: { SW: "dead" } } }],
    checkGroups: {
      stress: [{ name: "allowable stress", combinations: "allowable-stress", bendingStress: "11 MPa" }],
      deflection: [
        { name: "live", factors: { L: 1 }, limit: "span/360" },
        { name: "total", factors: { SW: 1, D: 1, L: 1 }, limit: ["span/240", "40 mm"] },
      ],
    },
  };
  const a = analyzeModel(parseModel(file));
  const c = a.combinations!;

  it("adds the self-weight, area x unit weight, as a dead case to the main results and the combinations", () => {
    // 0.2 m x 0.4 m x 25 kN/m^3 = 2 kN/m; with it, the whole load at factor 1 on both spans gives M_B = -w L^2 / 8 (AISC Manual, Table 3-23, case 29)
    expect(c.cases.map((x) => x.name)).toEqual(["D", "L", "SW"]);
    expect(a.moment.min.value).toBeCloseTo((-(wD + wL + 2) * L * L) / 8, 9);
  });

  it("gives the typed API's utilisation table, in the model's units", () => {
    const section = memberSection(rectangle({ width: 0.2, depth: 0.4 }));
    const beam = { length: 2 * L, stiffness: 12e9 * ((0.2 * 0.4 ** 3) / 12), supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: L }, { kind: "roller" as const, at: 2 * L }], loads: [{ kind: "distributed" as const, from: 0, to: 2 * L, start: 3000, end: 3000, case: "D" }, { kind: "distributed" as const, from: 0, to: 2 * L, start: 5000, end: 5000, case: "L" }, { kind: "distributed" as const, from: 0, to: 2 * L, start: 2000, end: 2000, case: "SW" }] };
    const cases = [...(twoSpans.cases as never[]), { name: "SW", category: "dead" as const }];
    const solved = solveCases(beam, cases);
    const asd = presetCombinations("asce7-16-allowable-stress", cases, { map: { SW: "dead" } }).combinations;
    const t = checkLoadCombinations(solved, section, {
      stress: [{ name: "allowable stress", combinations: asd, limits: { bendingStress: 11e6 } }],
      deflection: [{ name: "live", factors: { L: 1 }, limit: { kind: "ratio", ratio: 360, cantileverFactor: 1 } }, { name: "total", factors: { SW: 1, D: 1, L: 1 }, limit: [{ kind: "ratio", ratio: 240, cantileverFactor: 1 }, { kind: "absolute", limit: 0.04 }] }],
    });
    expect(c.checks.map((r) => [r.group, r.combination])).toEqual(t.rows.map((r) => [r.group, r.combination]));
    c.checks.forEach((r, i) => expect(r.utilisation).toBeCloseTo(t.rows[i]!.utilisation, 10));
    expect(c.governing).toBe(t.rows.indexOf(t.governing));
    const live = c.checks.find((r) => r.group === "live")!;
    expect(live.checks[live.governing]!.unit).toBe("mm");
    expect(live.checks[live.governing]!.pattern).toMatch(/^L on span [12]$/);
    expect(a.pass).toBe(t.pass);
    expect(c.pass).toBe(t.pass);
  });

  it("reads the examples: a roof beam under ASCE 7 and a two-span floor beam under EN 1990", () => {
    for (const name of ["roof-beam-asce7.json", "floor-beam-en1990.json"]) {
      const m = parseModel(JSON.parse(readFileSync(join(import.meta.dirname, "..", "..", "examples", "combinations", name), "utf8")));
      const r = analyzeModel(m).combinations!;
      expect(r.combinations.length).toBeGreaterThan(4);
      expect(r.checks.length).toBeGreaterThan(0);
    }
  });
});

describe("parseModel refuses bad cases and combinations, every issue at once", () => {
  const issues = (file: unknown): string[][] => {
    const r = tryParseModel(file);
    return r.ok ? [] : r.error.issues.map((i) => [i.code, i.path.join(".")]);
  };

  it("names unknown cases, cases with no loads, missing and non-finite factors, unknown preset options and a pattern cap beyond tractable", () => {
    expect(
      issues({
        ...twoSpans,
        cases: [...twoSpans.cases, { name: "S", category: "snow" }],
        loads: [...twoSpans.loads, { type: "point", at: 3, value: 1, case: "Q" }],
        combinations: [
          { preset: "asce7-16-strength", options: { liveException: true } },
          { name: "mine", purpose: "strength", factors: {} },
          { name: "big", purpose: "strength", factors: { D: "1e999", L: 1, X: 1 } },
        ],
        patterns: { cap: 30 },
        checkGroups: { stress: [{ name: "s", combinations: ["nope"], bendingStress: 100 }], deflection: [{ name: "d", limit: "span/360" }] },
      }),
    ).toMatchInlineSnapshot(`
      [
        [
          "unknown-case",
          "loads.2.case",
        ],
        [
          "case-no-loads",
          "cases.2",
        ],
        [
          "pattern-cap-too-large",
          "patterns.cap",
        ],
        [
          "preset-option-unknown",
          "combinations.0.options.liveException",
        ],
        [
          "combination-no-factors",
          "combinations.1.factors",
        ],
        [
          "not-a-number",
          "combinations.2.factors.D",
        ],
        [
          "unknown-case",
          "combinations.2.factors.X",
        ],
        [
          "unknown-combination",
          "checkGroups.stress.0.combinations.0",
        ],
        [
          "stress-group-without-section",
          "checkGroups.stress.0",
        ],
        [
          "group-cases-invalid",
          "checkGroups.deflection.0",
        ],
      ]
    `);
  });

  it("needs cases for combinations, a section for self-weight, and a weight per volume", () => {
    const { cases: _c, ...noCases } = twoSpans;
    expect(issues(noCases)).toEqual([["cases-missing", "combinations"]]);
    expect(issues({ ...twoSpans, selfWeight: { unitWeight: "25 kN/m^3" } })).toEqual([["self-weight-without-section", "selfWeight"]]);
    expect(issues({ ...twoSpans, section: { shape: "rectangle", width: 200, depth: 400 }, E: "12 GPa", I: undefined, selfWeight: { unitWeight: "25 kN/m^2" } }).map((i) => i[1])).toEqual(["selfWeight.unitWeight"]);
    expect(issues({ ...twoSpans, combinations: [{ preset: "asce7-16-strength" }, { name: "x", factors: { D: 1 } }] })).toEqual([["missing-field", "combinations.1.purpose"]]);
  });

  it("refuses a typed model built in code with fields of the wrong type", () => {
    const m = parseModel(twoSpans);
    const r = tryAnalyzeModel({ ...m, combinations: "asce" as never, checkGroups: { deflection: [{ name: "x", factors: { L: 1 }, limit: 5 as never }] } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => [i.code, i.path.join(".")])).toEqual([["wrong-type", "combinations"], ["wrong-type", "checkGroups.deflection.0.limit"]]);
  });
});
