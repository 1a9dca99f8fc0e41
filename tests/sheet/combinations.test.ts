// The combination and envelope functions in a real spreadsheet engine (HyperFormula): cases, a preset or a
// factors range, envelopes at a position, envelope peaks and reaction envelopes, every value compared with the
// typed API (flexura/combine on the same member), a few hand checks, an edit, and our messages in error cells.
import { fc, test as propTest } from "@fast-check/vitest";
import { describe, expect, test } from "vitest";
import { envelopes, presetCombinations, solveCases, type Combination, type Envelopes, type LoadCase } from "../../src/combine/index.js";
import { evaluatePiecewise, findPiece } from "../../src/math/index.js";
import { uniformLoad } from "../../src/loads/index.js";
import { callSheetFunction, isSheetError, sheetFunctions, sheetSolveCount } from "../../src/sheet/index.js";
import { workbook } from "./engine.js";

// An invented two-span floor beam: spans of 5 m and 6 m, E 200 GPa, I 80e6 mm^4; dead 2 kN/m, live 10 kN/m placed span by span.
const rows = (): (string | number | boolean | null)[][] => [
  ["length", 11, "", "supports", "", "", "loads", "", "", "", "", "", "cases", "", "", "", "factors", "D", "L"],
  ["E", "200 GPa", "", 0, "pin", "", "distributed", "", "", 2, "", "D", "D", "dead", "", "", "service", 1, 1],
  ["I", "80e6 mm^4", "", 5, "roller", "", "distributed", "", "", 10, "", "L", "L", "live", false, true, "", 1.2, 1.6],
  ["preset", "asce7-16-strength", "", 11, "roller"],
  [],
  ["=FLEXURA.ENVELOPE(\"moment\", \"min\", 5, M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)", "=FLEXURA.GOVERNING(\"moment\", \"min\", 5, M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)", "=FLEXURA.ENVELOPE(\"shear\", \"max\", 2.5, M2:P3, Q1:S3, , B1, B2, B3, D2:F4, G2:L3)", "=FLEXURA.ENVELOPE(\"deflection\", \"min\", 2.2, M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)"],
  ["=FLEXURA.ENVELOPEPEAKS(M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)"],
  [], [], [], [],
  ["=FLEXURA.REACTIONENVELOPE(M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)"],
  [], [], [], [],
  ["=FLEXURA.COMBINATIONS(M2:P3, B4)"],
];

const CASES: LoadCase[] = [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }];
/** The same member through the typed API, in SI (N, m): E I = 200e9 Pa * 80e-6 m^4. */
function typed(combinations: readonly Combination[]): Envelopes {
  const solved = solveCases(
    { length: 11, stiffness: 200e9 * 80e-6, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 5 }, { kind: "roller", at: 11 }], loads: [uniformLoad(0, 11, 2000, "D"), uniformLoad(0, 11, 10_000, "L")] },
    CASES,
  );
  return envelopes(solved, combinations);
}
const preset = (): readonly Combination[] => presetCombinations("asce7-16-strength", CASES).combinations;
/** Hogging moment at the middle support of two spans l1, l2 under w on both (three-moment equation, common practice). */
const middleMoment = (w: number, l1: number, l2: number): number => (-w * (l1 ** 3 + l2 ** 3)) / (8 * (l1 + l2));
const close = (got: unknown, want: number): void => {
  expect(typeof got).toBe("number");
  expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(want)));
};

describe("combination functions in HyperFormula", () => {
  test("ENVELOPE and GOVERNING equal the typed API's envelope at the position, and the hogging moment is the hand value", () => {
    const hf = workbook({ Beam: rows() });
    const at = (row: number, col: number): unknown => hf.getCellValue({ sheet: 0, row, col });
    const e = typed(preset());
    const lower = e.moment!.lower;
    close(at(5, 0), evaluatePiecewise(lower.curve, 5) / 1000);
    expect(at(5, 1)).toBe(e.arrangements[lower.governing[findPiece(lower.curve, 5)]!]!.name);
    // Both spans loaded, w = 1.2 * 2 + 1.6 * 10 kN/m (ASCE 7-16 2.3.1 (2)).
    close(at(5, 0), middleMoment(1.2 * 2 + 1.6 * 10, 5, 6));
    expect(at(5, 1)).toBe("1.2D + 1.6L, L on all spans");
    // The factors range gives its own combinations: the service row and 1.2D + 1.6L (named from its factors).
    const own = typed([{ name: "service", purpose: "strength", factors: { D: 1, L: 1 } }, { name: "1.2D + 1.6L", purpose: "strength", factors: { D: 1.2, L: 1.6 } }]);
    close(at(5, 2), evaluatePiecewise(own.shear!.upper.curve, 2.5) / 1000);
    close(at(5, 3), evaluatePiecewise(e.deflection!.lower.curve, 2.2) * 1000);
    hf.destroy();
  });
  test("ENVELOPEPEAKS and REACTIONENVELOPE spill the typed API's peaks and reactions, and the uplift is the hand value", () => {
    const hf = workbook({ Beam: rows() });
    const values = hf.getSheetValues(0);
    const e = typed(preset());
    const peaks = values.slice(6, 11).map((r) => r.slice(0, 7));
    expect(peaks[0]).toEqual(["quantity", "max", "at (m)", "governing", "min", "at (m)", "governing"]);
    const scale = { shear: 1000, moment: 1000, slope: 1, deflection: 1e-3 } as const;
    (["shear", "moment", "slope", "deflection"] as const).forEach((q, i) => {
      const d = e[q]!;
      const row = peaks[i + 1]!;
      close(row[1], d.upper.peak.value / scale[q]);
      close(row[2], d.upper.peak.at);
      expect(row[3]).toBe(d.upper.peak.name);
      close(row[4], d.lower.peak.value / scale[q]);
      close(row[5], d.lower.peak.at);
      expect(row[6]).toBe(d.lower.peak.name);
    });
    const reactions = values.slice(11, 15).map((r) => r.slice(0, 10));
    expect(reactions[0]![2]).toBe("max force (kN)");
    e.reactions.forEach((r, i) => {
      const row = reactions[i + 1]!;
      expect(row[0]).toBe(i + 1);
      close(row[1], r.at);
      close(row[2], r.force.max.value / 1000);
      expect(row[3]).toBe(r.force.max.name);
      close(row[4], r.force.min.value / 1000);
      expect(row[5]).toBe(r.force.min.name);
    });
    // Statics with the three-moment equation's support moment (common practice): 1.2D on both spans, 1.6L on
    // the second only, lifts the first support: R1 = w1 l1 / 2 + M_B / l1.
    const mB = middleMoment(1.2 * 2, 5, 6) + (-1.6 * 10 * 6 ** 3) / (8 * 11);
    close(reactions[1]![4], (1.2 * 2 * 5) / 2 + mB / 5);
    expect(reactions[1]![4]).toBeLessThan(0);
    expect(reactions[1]![5]).toBe("1.2D + 1.6L, L on span 2");
    // Middle support, both spans loaded: w (l1 + l2) / 2 - M_B (1 / l1 + 1 / l2).
    const w = 1.2 * 2 + 1.6 * 10;
    close(reactions[2]![2], (w * 11) / 2 - middleMoment(w, 5, 6) * (1 / 5 + 1 / 6));
    hf.destroy();
  });
  test("COMBINATIONS spills the preset's combinations as applied, with their clauses", () => {
    const hf = workbook({ Beam: rows() });
    const values = hf.getSheetValues(0);
    const list = preset();
    const table = values.slice(16, 17 + list.length).map((r) => r.slice(0, 5));
    expect(table[0]).toEqual(["combination", "purpose", "clause", "D", "L"]);
    list.forEach((c, i) => {
      expect(table[i + 1]!.slice(0, 3)).toEqual([c.name, c.purpose, c.clause]);
      expect(table[i + 1]![3] ?? null).toBe(c.factors["D"] ?? null);
      expect(table[i + 1]![4] ?? null).toBe(c.factors["L"] ?? null);
    });
    // ASCE 7-16 2.3.1 (1) and (2).
    expect(table[1]!.slice(0, 4)).toEqual(["1.4D", "strength", "ASCE 7-16 2.3.1 (1)", 1.4]);
    expect(table[2]!.slice(0, 5)).toEqual(["1.2D + 1.6L", "strength", "ASCE 7-16 2.3.1 (2)", 1.2, 1.6]);
    hf.destroy();
  });
  test("an edit to a load re-solves the member once and the envelope follows it", () => {
    const hf = workbook({ Beam: rows() });
    const before = sheetSolveCount();
    hf.setCellContents({ sheet: 0, row: 2, col: 9 }, 20); // live load 20 kN/m
    // The member analysis and its case-by-case solve, shared by the nine cells that ask about it.
    expect(sheetSolveCount() - before).toBe(2);
    close(hf.getCellValue({ sheet: 0, row: 5, col: 0 }), middleMoment(1.2 * 2 + 1.6 * 20, 5, 6));
    hf.destroy();
  });
  test("bad cases, factors, options and loads show our messages in the cell, naming the argument and row", () => {
    const message = (sheet: ReturnType<typeof rows>, row = 5, col = 0): string => {
      const hf = workbook({ Beam: sheet });
      const v = hf.getCellValue({ sheet: 0, row, col }) as { type?: string; message?: string };
      hf.destroy();
      expect(v.type).toBe("VALUE");
      return v.message ?? "";
    };
    let s = rows();
    s[2]![13] = "imposed";
    expect(message(s)).toBe('cases row 2, category: "imposed" is not a case category; use dead, live, roof-live, snow, rain, wind, seismic, crane, user.');
    s = rows();
    s[2]![15] = "maybe";
    expect(message(s)).toBe('cases row 2, patterned: "maybe" is not TRUE or FALSE.');
    s = rows();
    s[0]![18] = "Q";
    expect(message(s, 5, 2)).toMatch(/^combinations row 2, Q: The combination "service" names the case "Q", which is not among the load cases/);
    s = rows();
    s[2]![17] = "1.2x";
    expect(message(s, 5, 2)).toBe('combinations row 3, D: "1.2x" is not a load factor (a number).');
    s = rows();
    s[2]![11] = "LL";
    expect(message(s)).toMatch(/^loads row 2, case: The load names the case "LL", which is not among the load cases/);
    s = rows();
    s[3]![1] = "en1990-strength";
    expect(message(s)).toMatch(/^options, imposedCategory: The psi factors of a live case/);
    s = rows();
    s[3]![1] = "asce-strength";
    expect(message(s)).toMatch(/^combinations: "asce-strength" is not a preset; use asce7-16-strength/);
    s = rows();
    s[5]![0] = '=FLEXURA.ENVELOPE("moment", "min", 5, M2:P3, B4, A1:B1, B1, B2, B3, D2:F4, G2:L3)';
    expect(message(s)).toBe('options row 1, name: "length" is not an option; use loadsNotActing, liveFactorException, expression, imposedCategory, snowSite, settlementCase, cap, purpose or map.<case>.');
    s = rows();
    s[5]![0] = '=FLEXURA.ENVELOPE("torque", "min", 5, M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)';
    expect(message(s)).toBe('quantity: "torque" is not a result; use shear, moment, slope, deflection.');
    s = rows();
    s[5]![0] = '=FLEXURA.ENVELOPE("moment", "min", 12, M2:P3, B4, , B1, B2, B3, D2:F4, G2:L3)';
    expect(message(s)).toBe("position: 12 m is outside the member, which runs from 0 to 11 m.");
  });
});

describe("combination functions called directly", () => {
  const cases = [["D", "dead"], ["L", "live", "no", "yes"]];
  const member = [11, "200 GPa", "80e6 mm^4", [[0, "pin"], [5, "roller"], [11, "roller"]], [["distributed", null, null, 2, null, "D"], ["distributed", null, null, 10, null, "L"]]];
  test("EN 1990 with options from cells equals the typed preset's envelope", () => {
    const got = callSheetFunction("FLEXURA.ENVELOPE", ["moment", "min", 5, cases, "en1990-strength", [["imposed category", "b"], ["expression", 6.1], ["loadsNotActing", false]], ...member]);
    const e = typed(presetCombinations("en1990-strength", CASES, { imposedCategory: "B", expression: "6.10", loadsNotActing: false }).combinations);
    close(got, evaluatePiecewise(e.moment!.lower.curve, 5) / 1000);
    // EN 1990 Table A1.2(B), 6.10: 1.35 G + 1.5 Q on both spans.
    close(got, middleMoment(1.35 * 2 + 1.5 * 10, 5, 6));
  });
  test("a settlement needs its case named in the options, and then acts with its own factor", () => {
    const settled = [11, "200 GPa", "80e6 mm^4", [[0, "pin"], [5, "roller", 5], [11, "roller"]], [["distributed", null, null, 2, null, "D"]]];
    const oneCase = [["D", "dead"], ["T", "user"]];
    const refused = callSheetFunction("FLEXURA.ENVELOPE", ["moment", "min", 5, oneCase, [["c", "D", "T"], ["", 1, 1]], null, ...settled]);
    expect(refused).toMatchObject({ code: "settlement-case-missing" });
    const got = callSheetFunction("FLEXURA.ENVELOPE", ["moment", "max", 5, oneCase, [["c", "D", "T"], ["", 1, 1]], [["settlementCase", "T"]], ...settled]);
    const solved = solveCases(
      { length: 11, stiffness: 200e9 * 80e-6, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 5, settlement: 0.005 }, { kind: "roller", at: 11 }], loads: [uniformLoad(0, 11, 2000, "D")] },
      [{ name: "D", category: "dead" }, { name: "T", category: "user" }],
      { settlementCase: "T" },
    );
    const e = envelopes(solved, [{ name: "1.0D + 1.0T", purpose: "strength", factors: { D: 1, T: 1 } }]);
    close(got, evaluatePiecewise(e.moment!.upper.curve, 5) / 1000);
  });
  test("a preset's options on combinations given as factors, and blank factors everywhere, are refused", () => {
    expect(callSheetFunction("FLEXURA.COMBINATIONS", [cases, [["c", "D", "L"], ["", 1, 1]], [["imposedCategory", "B"]]])).toMatchObject({ code: "preset-option-unknown" });
    expect(callSheetFunction("FLEXURA.COMBINATIONS", [cases, [["c", "D", "L"], ["x", null, 0]]])).toMatchObject({ code: "combination-no-factors", message: "combinations row 2: give at least one factor that is not zero." });
    expect(callSheetFunction("FLEXURA.COMBINATIONS", [[["D", "dead"], ["D", "live"]], "asce7-16-strength"])).toMatchObject({ code: "sheet-value-repeated", message: 'cases row 2, name: "D" is given twice.' });
  });
  test("a cap above the largest is refused with the option named", () => {
    expect(callSheetFunction("FLEXURA.ENVELOPEPEAKS", [cases, "asce7-16-strength", [["cap", 40]], ...member])).toMatchObject({ code: "pattern-cap-too-large", message: expect.stringMatching(/^options, cap: /) as unknown });
  });
});

describe("combination functions: laws and bad input", () => {
  const arb = fc.record({
    first: fc.integer({ min: 2, max: 8 }),
    second: fc.integer({ min: 2, max: 8 }),
    dead: fc.integer({ min: 1, max: 20 }),
    live: fc.integer({ min: -10, max: 30 }),
    point: fc.integer({ min: -40, max: 40 }),
    at: fc.integer({ min: 0, max: 16 }),
    x: fc.integer({ min: 0, max: 16 }),
    factors: fc.array(fc.tuple(fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 })), { minLength: 1, maxLength: 4 }),
  });
  propTest.prop([arb])("ENVELOPE max and min at x are the largest and smallest of MOMENT at x over the rows, each with its loads factored", (m) => {
    const length = m.first + m.second;
    const supports = [[0, "pin"], [m.first, "roller"], [length, "roller"]];
    const at = (m.at * length) / 16;
    const x = (m.x * length) / 16;
    const rows = m.factors.map(([d, l]) => [d / 10, l / 10]).filter(([d, l]) => d !== 0 || l !== 0);
    fc.pre(rows.length > 0);
    const loads = (fd: number, fl: number, cased: boolean): unknown[][] => [
      ["distributed", null, null, m.dead * fd, null, cased ? "D" : null],
      ["distributed", null, null, m.live * fl, null, cased ? "L" : null],
      ["point", at, null, m.point * fl, null, cased ? "L" : null],
    ];
    const member = (fd: number, fl: number, cased: boolean): unknown[] => [length, "200 GPa", "80e6 mm^4", supports, loads(fd, fl, cased)];
    const factorsRange = [["combination", "D", "L"], ...rows.map(([d, l], i) => [`c${i}`, d === 0 ? null : d, l === 0 ? null : l])];
    const direct = rows.map(([d, l]) => callSheetFunction("FLEXURA.MOMENT", [x, ...member(d!, l!, false)]) as number);
    const scale = Math.max(1, ...direct.map((v) => Math.abs(v)), (m.dead + Math.abs(m.live)) * length ** 2, Math.abs(m.point) * length);
    const cases = [["D", "dead"], ["L", "live"]];
    const upper = callSheetFunction("FLEXURA.ENVELOPE", ["moment", "max", x, cases, factorsRange, null, ...member(1, 1, true)]);
    const lower = callSheetFunction("FLEXURA.ENVELOPE", ["moment", "min", x, cases, factorsRange, null, ...member(1, 1, true)]);
    expect(Math.abs((upper as number) - Math.max(...direct))).toBeLessThanOrEqual(1e-9 * scale);
    expect(Math.abs((lower as number) - Math.min(...direct))).toBeLessThanOrEqual(1e-9 * scale);
    // The governing row gives the bound's value.
    const name = callSheetFunction("FLEXURA.GOVERNING", ["moment", "max", x, cases, factorsRange, null, ...member(1, 1, true)]) as string;
    const i = rows.findIndex((_, k) => `c${k}` === name);
    expect(Math.abs(direct[i]! - (upper as number))).toBeLessThanOrEqual(1e-9 * scale);
  });
  const junk = fc.oneof(fc.constant(null), fc.string({ maxLength: 6 }), fc.double(), fc.boolean(), fc.constantFrom("dead", "live", "TRUE", "asce7-16-strength", "en1990-strength", "D", "L", "map.D", "cap", "settlementCase"));
  const junkRange = fc.array(fc.array(junk, { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 4 });
  propTest.prop([fc.oneof(junkRange, junk), fc.oneof(junkRange, junk), fc.oneof(junkRange, junk), junk, junk])(
    "junk in the cases, combinations and options cells is an error value or a finite answer, never thrown",
    (cases, combinations, options, quantity, x) => {
      const member = [11, "200 GPa", "80e6 mm^4", [[0, "pin"], [5, "roller"], [11, "roller"]], [["distributed", null, null, 2, null, "D"], ["distributed", null, null, 10, null, "L"]]];
      for (const f of sheetFunctions.filter((g) => ["FLEXURA.COMBINATIONS", "FLEXURA.ENVELOPE", "FLEXURA.ENVELOPEPEAKS", "FLEXURA.REACTIONENVELOPE"].includes(g.name))) {
        const args = f.name === "FLEXURA.COMBINATIONS" ? [cases, combinations, options] : f.name === "FLEXURA.ENVELOPE" ? [quantity, "max", x, cases, combinations, options, ...member] : [cases, combinations, options, ...member];
        const r = f.call(...args);
        if (isSheetError(r)) {
          expect(r.code).not.toBe("sheet-internal-error");
          expect(r.message.length).toBeGreaterThan(0);
        } else {
          const cells = Array.isArray(r) ? (r as unknown[][]).flat() : [r];
          for (const c of cells) if (typeof c === "number") expect(Number.isFinite(c)).toBe(true);
        }
      }
    },
  );
});
