// The sheet functions called as a spreadsheet calls them: plain cells in, a number, a table or an error out.
import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { analyzeModel, evaluateDiagram, parseModel } from "../../src/model/index.js";
import {
  clearSheetCache,
  isSheetError,
  memberModelJson,
  sheetDeflection,
  sheetFunctions,
  sheetModelResult,
  sheetMoment,
  sheetPeaks,
  sheetReactions,
  sheetSolveCount,
  sheetStations,
  SHEET_CACHE_SIZE,
  type SheetValue,
} from "../../src/sheet/index.js";

const supports = [[0, "pin", null], [6, "roller", null]];
const loads = [["distributed", null, null, 12], ["point", 2, null, 20]];
const member = [6, "200 GPa", "80e6 mm^4", supports, loads] as const;
const message = (v: SheetValue): string => (isSheetError(v) ? v.message : `not an error: ${JSON.stringify(v)}`);

describe("sheet functions", () => {
  test("a simple span: reactions, moment and deflection by the handbook formulas", () => {
    // Simple span, uniform load and a point load (common practice): R = w L / 2 + P b / L; M(a) = R a - w a^2 / 2;
    // midspan deflection of the uniform load alone 5 w L^4 / (384 E I), checked with the point load removed.
    const table = sheetReactions(...member) as unknown[][];
    expect(table[0]).toEqual(["support", "at (m)", "force (kN)", "moment (kN*m)"]);
    expect(table[1]![2]).toBeCloseTo(36 + 80 / 6, 10);
    expect(table.map((r) => r[0])).toEqual(["support", 1, 2]); // numbered from 1, as the supports range's rows
    expect(sheetMoment(2, ...member)).toBeCloseTo((36 + 80 / 6) * 2 - 24, 10);
    const udlOnly = [6, "200 GPa", "80e6 mm^4", supports, [loads[0]]] as const;
    const EI = 200e9 * 80e6 * 1e-12; // N m^2
    expect(sheetDeflection(3, ...udlOnly)).toBeCloseTo((-5 * 12e3 * 6 ** 4) / (384 * EI) * 1000, 8); // mm, downward
  });
  test("peaks and stations come with header rows and units", () => {
    const peaks = sheetPeaks(...member) as unknown[][];
    expect(peaks.map((r) => r[0])).toEqual(["quantity", "shear (kN)", "moment (kN*m)", "slope (rad)", "deflection (mm)"]);
    const stations = sheetStations(4, ...member) as number[][];
    expect(stations).toHaveLength(6);
    expect(stations[5]![0]).toBe(6);
    expect(stations[3]![2]).toBeCloseTo(sheetMoment(3, ...member) as number, 12);
    expect(message(sheetStations(0, ...member))).toMatch(/^stations: give a whole number/);
  });
  test("numbers stored as text, text with units, blank trailing rows and a unit set", () => {
    const text = sheetMoment("2", "6", "200 GPa", "80e6 mm^4", [...supports, [null, null, null]], [...loads, [null, null, null, null]]);
    expect(text).toBe(sheetMoment(2, ...member));
    const feet = sheetMoment(2, "19.685039370078740 ft", "200 GPa", "80e6 mm^4", supports, loads);
    expect(typeof feet).toBe("number");
    const kipFoot = sheetReactions(20, "29000 ksi", "500 in^4", [[0, "pin", null], [20, "roller", null]], [["distributed", null, null, 1]], "usKipFoot") as unknown[][];
    expect(kipFoot[0]).toEqual(["support", "at (ft)", "force (kip)", "moment (kip*ft)"]);
    expect(kipFoot[1]![2]).toBeCloseTo(10, 10); // w L / 2 = 1 kip/ft x 20 ft / 2 (common practice)
  });
  test("bad input: a message naming the argument and row, never a number", () => {
    expect(message(sheetMoment(2, 6, "200 GPa", "80e6 mm^4", [[0, "pinned", null]], loads))).toMatch(/^supports row 1, kind: "pinned" is not a support kind/);
    expect(message(sheetMoment(2, 6, "200 GPa", "80e6 mm^4", supports, [["point", 9, null, 20]]))).toMatch(/^loads row 1, position: /);
    expect(message(sheetMoment(2, 6, "200 GPa", "5 kN", supports, loads))).toMatch(/^I: /);
    expect(message(sheetMoment(7, ...member))).toMatch(/^position: 7 m is outside the member/);
    expect(message(sheetMoment("x", ...member))).toMatch(/^position: "x" is not a number/);
    expect(message(sheetReactions(6, "200 GPa", "80e6 mm^4", supports, loads, "metric"))).toMatch(/^units: "metric" is not a unit set/);
    expect(message(sheetReactions(6, "200 GPa", "80e6 mm^4", [[0, "roller", null]], loads))).not.toMatch(/not an error/);
  });
  test("every registered function checks its argument count and never throws", () => {
    for (const f of sheetFunctions) {
      expect(message(f.call())).toMatch(new RegExp(`^${f.name.replace(".", "\\.")} takes`));
      for (const junk of [[null, null, null, null, null, null], [NaN, Infinity, -Infinity, {}, [], Symbol.iterator]]) {
        const r = f.call(...junk.slice(0, f.parameters.length));
        expect(isSheetError(r)).toBe(true);
      }
    }
  });
  test("a model from JSON text, any result by path", () => {
    const json = JSON.stringify({ length: 6, E: "200 GPa", I: "80e6 mm^4", supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }], loads: [{ type: "distributed", start: 12 }] });
    expect(sheetModelResult(json, "moment.max.value")).toBeCloseTo(54, 10); // w L^2 / 8 (common practice)
    expect(sheetModelResult(json, "reactions[1].force")).toBeCloseTo(36, 10);
    expect(message(sheetModelResult(json, "moment.max"))).toMatch(/names a group of results/);
    expect(message(sheetModelResult(json, "moment.biggest"))).toMatch(/has no result at "biggest"/);
    expect(message(sheetModelResult(json, "constructor"))).toMatch(/has no result/);
    expect(message(sheetModelResult("{", "pass"))).toMatch(/^model: not valid JSON/);
    expect(message(sheetModelResult(json, "a..b"))).toMatch(/is not a path/);
  });
  test("the cache: one solve per distinct member, bounded", () => {
    clearSheetCache();
    const before = sheetSolveCount();
    for (let i = 0; i < 20; i++) sheetMoment(i * 0.3, ...member);
    sheetReactions(...member);
    expect(sheetSolveCount() - before).toBe(1);
    for (let i = 0; i < SHEET_CACHE_SIZE + 5; i++) sheetMoment(1, 6 + i / 1000, "200 GPa", "80e6 mm^4", [[0, "pin", null], [6 + i / 1000, "roller", null]], loads);
    const mid = sheetSolveCount();
    sheetMoment(2, ...member); // pushed out of the cache by the others: solved again
    expect(sheetSolveCount() - mid).toBe(1);
  });
});

describe("the cache by cells", () => {
  test("a warm cache never answers for other cells: NaN where a blank was is an error, not the blank's number", () => {
    clearSheetCache();
    const uniform = [["distributed", null, null, 12, null]];
    expect(typeof sheetMoment(3, 6, "200 GPa", "80e6 mm^4", supports, uniform)).toBe("number");
    expect(isSheetError(sheetMoment(3, 6, "200 GPa", "80e6 mm^4", supports, [["distributed", null, null, 12, Number.NaN]]))).toBe(true);
    expect(isSheetError(sheetMoment(3, 6, "200 GPa", "80e6 mm^4", supports, [["distributed", null, null, 12, "x"]]))).toBe(true);
    // The same member as other cells (6 as text) reads to the same model: solved once.
    const before = sheetSolveCount();
    sheetMoment(3, "6", "200 GPa", "80e6 mm^4", supports, uniform);
    expect(sheetSolveCount() - before).toBe(0);
  });
});

describe("sheet functions: laws", () => {
  const arbMember = fc.record({
    length: fc.integer({ min: 2, max: 20 }),
    p: fc.integer({ min: -50, max: 50 }),
    at: fc.integer({ min: 0, max: 16 }),
    w: fc.integer({ min: -20, max: 20 }),
    x: fc.integer({ min: 0, max: 16 }),
  });
  test.prop([arbMember])("every value equals the typed API's for the same model", ({ length, p, at, w, x }) => {
    const s = [[0, "pin", null], [length, "roller", null]];
    const l = [["point", (at * length) / 16, null, p], ["distributed", null, null, w]];
    const json = memberModelJson(length, "200 GPa", "80e6 mm^4", s, l, null);
    const a = analyzeModel(parseModel(json));
    const pos = (x * length) / 16;
    expect(sheetMoment(pos, length, "200 GPa", "80e6 mm^4", s, l)).toBe(evaluateDiagram(a.diagrams.moment, pos));
    expect(sheetDeflection(pos, length, "200 GPa", "80e6 mm^4", s, l)).toBe(evaluateDiagram(a.diagrams.deflection, pos));
    const r = sheetReactions(length, "200 GPa", "80e6 mm^4", s, l) as number[][];
    // Equilibrium (common practice): the reactions carry the loads, p + w L.
    expect(r[1]![2]! + r[2]![2]!).toBeCloseTo(p + w * length, 8);
  });
});
