// An invented example workbook: the members of a small warehouse mezzanine (primary beams, joists, an edge
// beam with an overhang, a landing cantilever, a stair trimmer, a beam with cover plates and a goods-lift
// beam), each checked in the sheet with flexura's spreadsheet functions. Written with exceljs; formulas only
// (a sheet engine with flexura's functions loaded computes them; see docs/sheet.md).
import ExcelJS from "exceljs";

/** One member of the example: its block of cells on the Members sheet. */
export interface ExampleMember {
  readonly mark: string;
  readonly description: string;
  /** Span in m. */
  readonly length: number;
  /** Modulus, text with its unit. */
  readonly E: string;
  /** A shape and its dimensions (mm), or stiffness segments `start | end | I` for a stepped member. */
  readonly section: { readonly shape: string; readonly dimensions: readonly (readonly [string, number])[] } | { readonly segments: readonly (readonly [number, number, string])[] };
  /** Rows of position (m) | kind | value. */
  readonly supports: readonly (readonly [number, string, (number | string)?])[];
  /** Rows of kind | position | end position | value | end value (kN, kN/m, m). */
  readonly loads: readonly (readonly (number | string | null)[])[];
  /** Rows of name | value. */
  readonly limits: readonly (readonly [string, number | string])[];
  /** When its loads name the cases of {@link CASES}: the envelope over the ASCE 7-16 strength combinations is asked for too. */
  readonly enveloped?: boolean;
}

/** The load cases the enveloped members' loads name: rows of name | category | reversible | patterned. */
export const CASES: readonly (readonly [string, string, boolean, boolean])[] = [
  ["D", "dead", false, false],
  ["L", "live", false, true],
];

const beam = [["depth", 310], ["flangeWidth", 165], ["flangeThickness", 9.7], ["webThickness", 5.8]] as const;
const joist = [["depth", 200], ["flangeWidth", 75], ["flangeThickness", 11], ["webThickness", 8.5]] as const;
const steel = [["deflection", "span/360"], ["bendingStress", "165 MPa"], ["shearStress", "95 MPa"]] as const;
const pinRoller = (l: number): ExampleMember["supports"] => [[0, "pin"], [l, "roller"]];

/** The dozen members, with invented loads in kN, kN/m and m. */
export const MEMBERS: readonly ExampleMember[] = [
  { mark: "PB1", description: "Primary beam, grid A", length: 6, E: "200 GPa", section: { shape: "i-section", dimensions: beam }, supports: pinRoller(6), loads: [["point", 2, null, 24], ["point", 4, null, 24], ["distributed", null, null, 1.2]], limits: steel },
  { mark: "PB2", description: "Primary beam, grid B", length: 6, E: "200 GPa", section: { shape: "i-section", dimensions: beam }, supports: pinRoller(6), loads: [["point", 1.5, null, 30], ["point", 4.5, null, 30], ["distributed", null, null, 1.2]], limits: steel },
  { mark: "PB3", description: "Primary beam, grid C, over a middle post", length: 8, E: "200 GPa", section: { shape: "i-section", dimensions: [["depth", 360], ["flangeWidth", 170], ["flangeThickness", 12.7], ["webThickness", 8]] }, supports: [[0, "pin"], [4, "roller"], [8, "roller"]], loads: [["distributed", null, null, 3, null, "D"], ["distributed", null, null, 6, null, "L"]], limits: steel, enveloped: true },
  { mark: "J1", description: "Joist, bay 1", length: 4, E: "200 GPa", section: { shape: "channel", dimensions: joist }, supports: pinRoller(4), loads: [["distributed", null, null, 4.5]], limits: steel },
  { mark: "J2", description: "Joist, bay 2", length: 4, E: "200 GPa", section: { shape: "channel", dimensions: joist }, supports: pinRoller(4), loads: [["distributed", null, null, 5.2]], limits: steel },
  { mark: "J3", description: "Joist, bay 3, pallet racking strip", length: 4, E: "200 GPa", section: { shape: "channel", dimensions: joist }, supports: pinRoller(4), loads: [["distributed", null, null, 4.5], ["distributed", 1, 3, 6]], limits: steel },
  { mark: "J4", description: "Joist, bay 4, under a hoist point", length: 4, E: "200 GPa", section: { shape: "channel", dimensions: joist }, supports: pinRoller(4), loads: [["distributed", null, null, 4.5], ["point", 2, null, 5]], limits: steel },
  { mark: "EB1", description: "Edge beam with an overhang", length: 6.2, E: "200 GPa", section: { shape: "rectangular-hollow", dimensions: [["width", 100], ["depth", 200], ["wallThickness", 8]] }, supports: pinRoller(5), loads: [["distributed", null, null, 3], ["point", 6.2, null, 6]], limits: steel },
  { mark: "LB1", description: "Landing cantilever", length: 1.5, E: "200 GPa", section: { shape: "rectangular-hollow", dimensions: [["width", 100], ["depth", 150], ["wallThickness", 6]] }, supports: [[0, "fixed"]], loads: [["point", 1.5, null, 8], ["distributed", null, null, 2]], limits: [["deflection", "span/180"], ["bendingStress", "165 MPa"]] },
  { mark: "ST1", description: "Stair trimmer", length: 3, E: "200 GPa", section: { shape: "pipe", dimensions: [["outsideDiameter", 168.3], ["wallThickness", 7.1]] }, supports: pinRoller(3), loads: [["point", 1.2, null, 12]], limits: steel },
  { mark: "CP1", description: "Beam with cover plates over its middle", length: 7, E: "200 GPa", section: { segments: [[0, 2, "180e6 mm^4"], [2, 5, "260e6 mm^4"], [5, 7, "180e6 mm^4"]] }, supports: pinRoller(7), loads: [["distributed", null, null, 10]], limits: [["deflection", "span/360"]] },
  { mark: "GL1", description: "Goods-lift beam", length: 5, E: "200 GPa", section: { shape: "plate-girder", dimensions: [["topFlange.width", 250], ["topFlange.thickness", 16], ["web.depth", 400], ["web.thickness", 8]] }, supports: pinRoller(5), loads: [["point", 2.5, null, 40], ["distributed", null, null, 2]], limits: steel },
];

/** Rows per member block on the Members sheet (the most rows any of its ranges needs). */
export const BLOCK_ROWS = 4;
/** The first row (1-based) of the member blocks, under the two heading rows. */
export const FIRST_ROW = 3;

/** Where each range of a member's block sits: columns, and its result cells. */
export const COLUMNS = {
  mark: "A", description: "B", length: "C", E: "D", shape: "E", dims: ["F", "H"], supports: ["I", "K"], loads: ["L", "Q"], limits: ["R", "S"],
  I: "T", reaction: "U", moment: "V", maxMoment: "W", deflection: "X", utilisation: "Y", envelope: "Z",
} as const;

/** The first row (1-based) of the cases table, under the member blocks, the caution and a heading. */
export const CASES_ROW = FIRST_ROW + MEMBERS.length * BLOCK_ROWS + 3;
/** The cases table's range. */
const CASES_RANGE = `$A$${CASES_ROW}:$D$${CASES_ROW + 1}`;

const range = ([a, b]: readonly [string, string], r: number): string => `${a}${r}:${b}${r + BLOCK_ROWS - 1}`;

/** The formulas of one member's result cells, by column (or by cell, for the envelope's two), for the block starting at row `r`. */
export function memberFormulas(m: ExampleMember, r: number): Readonly<Record<string, string>> {
  const c = COLUMNS;
  const stiffness = "segments" in m.section ? range(c.dims, r) : `${c.I}${r}`;
  const member = `${c.length}${r}, ${c.E}${r}, ${stiffness}, ${range(c.supports, r)}, ${range(c.loads, r)}`;
  const shape = "segments" in m.section ? "" : `${c.shape}${r}`;
  const dims = "segments" in m.section ? "" : range(["F", "G"], r);
  const envelope = `FLEXURA.ENVELOPEPEAKS(${CASES_RANGE}, "asce7-16-strength", , ${member})`;
  return {
    // The envelope's peak hogging moment (row 3: moment; column 5: min) and, in the row below, its governing combination.
    ...(m.enveloped === true ? { [`${c.envelope}${r}`]: `INDEX(${envelope}, 3, 5)`, [`${c.envelope}${r + 1}`]: `INDEX(${envelope}, 3, 7)` } : {}),
    ...("segments" in m.section ? {} : { [c.I]: `FLEXURA.SECTIONPROPERTY("secondMomentZ", ${c.shape}${r}, ${dims})` }),
    [c.reaction]: `INDEX(FLEXURA.REACTIONS(${member}), 2, 3)`,
    [c.moment]: `FLEXURA.MOMENT(${c.length}${r} / 2, ${member})`,
    [c.maxMoment]: `INDEX(FLEXURA.PEAKS(${member}), 3, 2)`,
    [c.deflection]: `INDEX(FLEXURA.PEAKS(${member}), 5, 4)`,
    [c.utilisation]: `FLEXURA.UTILISATION(${range(c.limits, r)}, ${shape}, ${dims}, ${c.length}${r}, ${c.E}${r}, ${"segments" in m.section ? stiffness : ""}, ${range(c.supports, r)}, ${range(c.loads, r)})`,
  };
}

/** The example workbook: one sheet of member blocks, inputs and formulas. */
export function mezzanineWorkbook(): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = "flexura example";
  wb.created = new Date(Date.UTC(2026, 11, 3));
  wb.modified = wb.created;
  const ws = wb.addWorksheet("Members");
  ws.getCell("A1").value = "Warehouse mezzanine (invented example): members checked with flexura's sheet functions. Units m, kN, kN*m, kN/m, mm, MPa.";
  const heads: Record<string, string> = {
    A: "mark", B: "member", C: "span (m)", D: "E", E: "shape", F: "dimension / start", G: "value (mm) / end", H: "I (segments)",
    I: "support at (m)", J: "kind", K: "value", L: "load kind", M: "at / from (m)", N: "to (m)", O: "value", P: "end value", Q: "case",
    R: "limit", S: "value", T: "I (mm^4)", U: "left reaction (kN)", V: "moment at midspan (kN*m)", W: "peak sagging moment (kN*m)", X: "peak deflection (mm, up +)", Y: "utilisation",
    Z: "envelope, ASCE 7-16 strength: peak hogging moment (kN*m), governing combination",
  };
  for (const [col, text] of Object.entries(heads)) ws.getCell(`${col}2`).value = text;
  for (const [i, m] of MEMBERS.entries()) {
    const r = FIRST_ROW + i * BLOCK_ROWS;
    const set = (col: string, row: number, value: string | number | null | undefined): void => {
      if (value !== null && value !== undefined && value !== "") ws.getCell(`${col}${row}`).value = value;
    };
    set("A", r, m.mark);
    set("B", r, m.description);
    set("C", r, m.length);
    set("D", r, m.E);
    if ("segments" in m.section) {
      m.section.segments.forEach((s, j) => s.forEach((v, k) => set(["F", "G", "H"][k]!, r + j, v)));
    } else {
      set("E", r, m.section.shape);
      m.section.dimensions.forEach(([name, value], j) => {
        set("F", r + j, name);
        set("G", r + j, value);
      });
    }
    m.supports.forEach((s, j) => s.forEach((v, k) => set(["I", "J", "K"][k]!, r + j, v)));
    m.loads.forEach((l, j) => l.forEach((v, k) => set(["L", "M", "N", "O", "P", "Q"][k]!, r + j, v)));
    m.limits.forEach(([name, value], j) => {
      set("R", r + j, name);
      set("S", r + j, value);
    });
    for (const [col, formula] of Object.entries(memberFormulas(m, r))) ws.getCell(/\d/.test(col) ? col : `${col}${r}`).value = { formula };
  }
  ws.getCell(`A${FIRST_ROW + MEMBERS.length * BLOCK_ROWS + 1}`).value =
    "Caution: elastic first-order analysis; you are responsible for the loads, code compliance and review by a licensed engineer; local codes govern.";
  ws.getCell(`A${CASES_ROW - 1}`).value = "Load cases (name | category | reversible | patterned) of the members whose loads name a case";
  CASES.forEach((row, j) => row.forEach((v, k) => (ws.getCell(`${"ABCD"[k]!}${CASES_ROW + j}`).value = v)));
  return wb;
}
