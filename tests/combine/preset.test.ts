// Preset factors against the standards' tables. ASCE 7-16 (Minimum Design Loads and Associated
// Criteria for Buildings and Other Structures) 2.3.1 and 2.4.1, with the seismic rows of 2.3.6
// and 2.4.5 in the simplified form with one seismic case E (from memory: the row numbers and the
// exception's reach); EN 1990:2002 + A1:2005 Annex A1, Tables A1.1 and A1.2(B), expressions 6.10,
// 6.10a, 6.10b, 6.14b, 6.15b, 6.16b (recommended values).
import { describe, expect, it } from "vitest";
import { formatCombinations, presetCombinations, tryPresetCombinations, type LoadCase } from "../../src/combine/index.js";

const ALL: readonly LoadCase[] = [
  { name: "D", category: "dead" },
  { name: "L", category: "live" },
  { name: "Lr", category: "roof-live" },
  { name: "S", category: "snow" },
  { name: "R", category: "rain" },
  { name: "W", category: "wind" },
  { name: "E", category: "seismic" },
];
const factorsOf = (p: ReturnType<typeof presetCombinations>): Record<string, number>[] => p.combinations.map((c) => ({ ...c.factors }));

describe("presetCombinations(asce7-16-strength)", () => {
  it("gives the rows of ASCE 7-16 2.3.1 and 2.3.6 with each 'or' expanded", () => {
    const p = presetCombinations("asce7-16-strength", ALL, { loadsNotActing: false });
    // 2.3.1: (1) 1.4D; (2) 1.2D + 1.6L + 0.5(Lr or S or R); (3) 1.2D + 1.6(Lr or S or R) + (L or 0.5W);
    // (4) 1.2D + 1.0W + L + 0.5(Lr or S or R); (5) 0.9D + 1.0W; 2.3.6: (6) 1.2D + 1.0E + L + 0.2S; (7) 0.9D + 1.0E
    const expected: Record<string, number>[] = [{ D: 1.4 }];
    for (const x of ["Lr", "S", "R"]) expected.push({ D: 1.2, L: 1.6, [x]: 0.5 });
    for (const x of ["Lr", "S", "R"]) expected.push({ D: 1.2, L: 1.0, [x]: 1.6 });
    for (const x of ["Lr", "S", "R"]) expected.push({ D: 1.2, [x]: 1.6, W: 0.5 });
    for (const x of ["Lr", "S", "R"]) expected.push({ D: 1.2, L: 1.0, [x]: 0.5, W: 1.0 });
    expected.push({ D: 0.9, W: 1.0 }, { D: 1.2, L: 1.0, S: 0.2, E: 1.0 }, { D: 0.9, E: 1.0 });
    expect(factorsOf(p)).toEqual(expected);
    expect(p.combinations[1]?.clause).toBe("ASCE 7-16 2.3.1 (2)");
    expect(p.combinations.every((c) => c.purpose === "strength")).toBe(true);
    expect(p.omitted).toEqual([]);
  });

  it("takes 0.5 on L in rows 3, 4 and 6 under the exception of 2.3.1", () => {
    const p = presetCombinations("asce7-16-strength", ALL.filter((c) => ["D", "L", "W", "E"].includes(c.name)), { loadsNotActing: false, liveFactorException: true });
    expect(factorsOf(p)).toEqual([{ D: 1.4 }, { D: 1.2, L: 1.6 }, { D: 1.2, L: 0.5 }, { D: 1.2, W: 0.5 }, { D: 1.2, L: 0.5, W: 1.0 }, { D: 0.9, W: 1.0 }, { D: 1.2, L: 0.5, E: 1.0 }, { D: 0.9, E: 1.0 }]);
  });

  it("leaves out the seismic rows and the missing categories, and says so", () => {
    const p = presetCombinations("asce7-16-strength", [ALL[0]!, ALL[1]!], { loadsNotActing: false });
    expect(factorsOf(p)).toEqual([{ D: 1.4 }, { D: 1.2, L: 1.6 }, { D: 1.2, L: 1.0 }, { D: 1.2 }, { D: 0.9 }]);
    expect(p.omitted).toEqual(["roof-live", "snow", "rain", "wind", "seismic"]);
    expect(p.notes.join(" ")).toContain("seismic rows are left out");
  });

  it("forms each combination with its variable loads not acting, once each", () => {
    const p = presetCombinations("asce7-16-strength", [ALL[0]!, ALL[1]!]);
    expect(p.combinations.map((c) => c.name)).toEqual(["1.4D", "1.2D + 1.6L", "1.2D", "1.2D + 1.0L", "0.9D"]);
  });

  it("gives one combination per sense of a reversible case (row 2 without variables is 1.2D)", () => {
    const p = presetCombinations("asce7-16-strength", [ALL[0]!, { name: "W", category: "wind", reversible: true }], { loadsNotActing: false });
    expect(p.combinations.map((c) => c.name)).toEqual(["1.4D", "1.2D", "1.2D + 0.5W", "1.2D - 0.5W", "1.2D + 1.0W", "1.2D - 1.0W", "0.9D + 1.0W", "0.9D - 1.0W"]);
  });
});

describe("presetCombinations(asce7-16-allowable-stress)", () => {
  it("gives the rows of ASCE 7-16 2.4.1 and 2.4.5", () => {
    const p = presetCombinations("asce7-16-allowable-stress", ALL.filter((c) => ["D", "L", "S", "W", "E"].includes(c.name)), { loadsNotActing: false });
    // (1) D; (2) D + L; (3) D + (Lr or S or R); (4) D + 0.75L + 0.75(Lr or S or R); (5) D + 0.6W;
    // (6) D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R); (7) 0.6D + 0.6W; (8) D + 0.7E;
    // (9) D + 0.75L + 0.75(0.7E) + 0.75S; (10) 0.6D + 0.7E
    expect(factorsOf(p)).toEqual([
      { D: 1 }, { D: 1, L: 1 }, { D: 1, S: 1 }, { D: 1, L: 0.75, S: 0.75 }, { D: 1, W: 0.6 }, { D: 1, L: 0.75, S: 0.75, W: 0.45 },
      { D: 0.6, W: 0.6 }, { D: 1, E: 0.7 }, { D: 1, L: 0.75, S: 0.75, E: 0.525 }, { D: 0.6, E: 0.7 },
    ]);
    expect(p.combinations.every((c) => c.purpose === "allowable-stress")).toBe(true);
  });
});

describe("presetCombinations(en1990-strength)", () => {
  const cases: LoadCase[] = [{ name: "G", category: "dead" }, { name: "Q", category: "live" }, { name: "S", category: "snow" }, { name: "W", category: "wind" }];
  it("takes each variable leading in 6.10 with gamma_G 1.35 and 1.00, gamma_Q 1.5 and psi_0 of Table A1.1", () => {
    // category B offices psi_0 0.7; snow at up to 1000 m psi_0 0.5; wind psi_0 0.6
    const p = presetCombinations("en1990-strength", cases, { imposedCategory: "B", loadsNotActing: false });
    const set = (g: number): Record<string, number>[] => [{ G: g }, { G: g, Q: 1.5, S: 0.75, W: 0.9 }, { G: g, Q: 1.05, S: 1.5, W: 0.9 }, { G: g, Q: 1.05, S: 0.75, W: 1.5 }];
    expect(factorsOf(p)).toEqual([...set(1.35), ...set(1.0)]);
    expect(p.combinations[1]?.clause).toBe("EN 1990 A1.3.1 (6.10), G unfavourable, Q leading");
  });

  it("forms 6.10a and 6.10b with xi = 0.85", () => {
    const p = presetCombinations("en1990-strength", cases, { imposedCategory: "E", expression: "6.10a-b", loadsNotActing: false });
    // category E storage psi_0 1.0; 6.10a: 1.35G + 1.5 psi_0 Q; 6.10b: 0.85 x 1.35 = 1.1475 G + 1.5 Q_1 + 1.5 psi_0 Q_i
    expect(factorsOf(p).slice(0, 5)).toEqual([{ G: 1.35, Q: 1.5, S: 0.75, W: 0.9 }, { G: 1.1475 }, { G: 1.1475, Q: 1.5, S: 0.75, W: 0.9 }, { G: 1.1475, Q: 1.5, S: 1.5, W: 0.9 }, { G: 1.1475, Q: 1.5, S: 0.75, W: 1.5 }]);
    expect(factorsOf(p)[5]).toEqual({ G: 1, Q: 1.5, S: 0.75, W: 0.9 });
  });

  it("refuses a live case without its category of use", () => {
    const r = tryPresetCombinations("en1990-strength", cases);
    expect(r.ok ? [] : r.error.issues.map((i) => i.code)).toEqual(["preset-option-missing"]);
  });
});

describe("presetCombinations(en1990-serviceability)", () => {
  it("gives the characteristic, frequent and quasi-permanent combinations with psi_0, psi_1, psi_2", () => {
    // category C: 0.7 / 0.7 / 0.6; wind 0.6 / 0.2 / 0
    const p = presetCombinations("en1990-serviceability", [{ name: "G", category: "dead" }, { name: "Q", category: "live" }, { name: "W", category: "wind" }], { imposedCategory: "C", loadsNotActing: false });
    expect(p.combinations.map((c) => [c.clause, c.factors])).toEqual([
      ["EN 1990 A1.4.1 (6.14b) characteristic, no variable action", { G: 1 }],
      ["EN 1990 A1.4.1 (6.14b) characteristic, Q leading", { G: 1, Q: 1, W: 0.6 }],
      ["EN 1990 A1.4.1 (6.14b) characteristic, W leading", { G: 1, Q: 0.7, W: 1 }],
      ["EN 1990 A1.4.1 (6.15b) frequent, Q leading", { G: 1, Q: 0.7 }],
      ["EN 1990 A1.4.1 (6.15b) frequent, W leading", { G: 1, Q: 0.6, W: 0.2 }],
      ["EN 1990 A1.4.1 (6.16b) quasi-permanent", { G: 1, Q: 0.6 }],
    ]);
    // the frequent and quasi-permanent combinations without variable actions equal the characteristic one: given once
  });
});

describe("presetCombinations errors", () => {
  it("names every case no row covers, unless mapped", () => {
    const cases: LoadCase[] = [{ name: "D", category: "dead" }, { name: "crane", category: "crane" }, { name: "T", category: "user" }];
    const r = tryPresetCombinations("asce7-16-strength", cases);
    expect(r.ok ? [] : r.error.issues.map((i) => [i.code, i.path, i["name"]])).toEqual([["case-not-covered", ["cases", 1], "crane"], ["case-not-covered", ["cases", 2], "T"]]);
    const mapped = presetCombinations("asce7-16-strength", cases, { map: { crane: "live", T: "dead" }, loadsNotActing: false });
    expect(mapped.combinations[0]?.factors).toEqual({ D: 1.4, T: 1.4 });
  });

  it("collects unknown presets, options and mapped names", () => {
    const r = tryPresetCombinations("asce7-16-strength", [{ name: "D", category: "dead" }], { liveFactorExeption: true, map: { DD: "dead", D: "deadish" } } as never);
    expect(r.ok ? [] : r.error.issues.map((i) => [i.code, i.path])).toEqual([
      ["preset-option-unknown", ["options", "liveFactorExeption"]],
      ["unknown-case", ["options", "map", "DD"]],
      ["category-unknown", ["options", "map", "D"]],
    ]);
    expect(r.ok ? "" : r.error.issues[0]?.message).toContain('Did you mean "liveFactorException"?');
    const u = tryPresetCombinations("asce-strength" as never, []);
    expect(u.ok ? "" : u.error.code).toBe("preset-unknown");
  });
});

describe("formatCombinations", () => {
  it("prints what is applied, with purpose and clause", () => {
    const p = presetCombinations("asce7-16-strength", [{ name: "D", category: "dead" }, { name: "L", category: "live" }], { loadsNotActing: false });
    expect(formatCombinations(p.combinations)).toMatchInlineSnapshot(`
      "  1  1.4D         (strength; ASCE 7-16 2.3.1 (1))
        2  1.2D + 1.6L  (strength; ASCE 7-16 2.3.1 (2))
        3  1.2D + 1.0L  (strength; ASCE 7-16 2.3.1 (3))
        4  1.2D         (strength; ASCE 7-16 2.3.1 (3))
        5  0.9D         (strength; ASCE 7-16 2.3.1 (5))"
    `);
  });
});
