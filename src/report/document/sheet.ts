import type { Model, ModelAnalysis, ModelCheck, ModelLoad } from "../../model/index.js";
import { REPORT_CAUTION } from "../caution.js";
import { escapeXml } from "../escape.js";
import { formatReportNumber, snapToZero, utilisationText } from "../format.js";
import { calculationFigure, type CalculationFigure } from "./figure.js";
import { sectionStressFigure } from "./section-figure.js";
import { sha256Hex } from "./sha256.js";
import { printedUnit } from "./units.js";
import { FLEXURA_VERSION } from "./version.js";

/**
 * The title-block fields of a calculation sheet. Every field is optional and shown blank when
 * absent, so a checker sees what was left unfilled.
 */
export interface CalculationSheetJob {
  /** Project name or number. */
  readonly project?: string;
  /** Member mark or name; default the model's name. */
  readonly member?: string;
  /** Who prepared the calculation. */
  readonly engineer?: string;
  /** Who checked it. */
  readonly checker?: string;
  /** Date of the calculation, as the user writes dates. */
  readonly date?: string;
  /** Revision mark. */
  readonly revision?: string;
}

/** The input file a sheet was made from: its name and its exact bytes (hashed with SHA-256). */
export interface CalculationSheetInput {
  /** The file's name as the user knows it. */
  readonly name: string;
  /** The file's bytes, or its text (hashed as UTF-8). */
  readonly bytes: Uint8Array | string;
}

/** What goes on a calculation sheet besides the analysis. */
export interface CalculationSheetOptions {
  /** Title-block fields. */
  readonly job?: CalculationSheetJob;
  /** The input file, named and hashed in the header. */
  readonly input?: CalculationSheetInput;
  /** Paper size for printing; default `"a4"`. */
  readonly paper?: "a4" | "letter";
  /** Units in plain text (`kN*m`) rather than print form (`kN·m`); default false. */
  readonly plainUnits?: boolean;
  /** Document title (the HTML `<title>`); default "flexura calculation: " and the member. */
  readonly title?: string;
}

/** One member of a {@link calculationBook}: its analysis and its sheet's options. */
export interface CalculationBookMember {
  /** What `analyzeModel` returned. */
  readonly analysis: ModelAnalysis;
  /** Title block and input file of this member's page. */
  readonly options?: CalculationSheetOptions;
}

/** Names longer than this are shortened in the title block and tables, the full text in a footnote. */
const LONG_NAME = 72;

/** Above this many supports, the results tables are summarised first and set in columns. */
const MANY_ROWS = 40;

/**
 * A calculation sheet for one member: a self-contained HTML document (inline SVG and CSS, no
 * scripts, no external files) that prints on A4 or US Letter, with a title block (project, member,
 * engineer, checker, date, revision; the program and its version; the input file's name and
 * SHA-256), the inputs (geometry, supports, loads by case, section, material, limits, units), one
 * figure with the member and its shear, moment and deflection on a shared x axis, the results
 * (reactions, peaks with their locations, section properties, stresses), the checks with
 * utilisation to three significant figures and the verdict, the method statement, and the caution.
 * Every text from the model or the options is escaped. Pure: no I/O.
 *
 * @param analysis - What `analyzeModel` returned.
 * @param options - Title block, input file, paper and unit spelling.
 * @returns The HTML document.
 * @example
 * ```ts
 * const html = calculationSheet(analyzeModel(parseModel(text)), { input: { name: "beam.json", bytes: text }, job: { project: "Depot" } });
 * ```
 */
export function calculationSheet(analysis: ModelAnalysis, options: CalculationSheetOptions = {}): string {
  return calculationBook([{ analysis, options }], options);
}

/**
 * Several members in one printable document, one member per page (page breaks between them),
 * each page as {@link calculationSheet} draws it.
 *
 * @param members - The members, in page order, each with its own title block and input file.
 * @param options - Paper and title for the whole document (a member's own options add to these).
 * @returns The HTML document.
 * @example
 * ```ts
 * calculationBook([{ analysis: a1, options: { job: { member: "B1" } } }, { analysis: a2 }], { paper: "letter" });
 * ```
 */
export function calculationBook(members: readonly CalculationBookMember[], options: CalculationSheetOptions = {}): string {
  const paper = options.paper ?? "a4";
  const first = members[0]?.analysis.model.name ?? "member";
  const title = options.title ?? `flexura calculation: ${members.length === 1 ? first : `${members.length} members`}`;
  const pages = members.map((m) => memberPage(m.analysis, { ...options, ...m.options, job: { ...options.job, ...m.options?.job } }));
  return (
    `<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>${escapeXml(title)}</title>\n` +
    `<meta name="generator" content="flexura ${escapeXml(FLEXURA_VERSION)}">\n<style>${css(paper)}</style>\n</head>\n<body>\n${pages.join("\n")}\n</body>\n</html>\n`
  );
}

class Notes {
  readonly items: string[] = [];
  /** The text, shortened with a footnote mark when it is long; escaped. */
  short(text: string): string {
    if ([...text].length <= LONG_NAME) return escapeXml(text);
    this.items.push(text);
    return `${escapeXml([...text].slice(0, LONG_NAME - 1).join(""))}…<sup>${this.items.length}</sup>`;
  }
}

function memberPage(analysis: ModelAnalysis, options: CalculationSheetOptions): string {
  const model = analysis.model;
  const plain = options.plainUnits === true;
  const notes = new Notes();
  const figure = calculationFigure(analysis, { plainUnits: plain });
  const job = options.job ?? {};
  const memberName = job.member ?? model.name ?? "";
  const out: string[] = [];
  out.push(`<section class="member">`);
  out.push(titleBlock(job, memberName, options.input, notes));
  if (figure.simplified) {
    out.push(`<p class="warning" data-flag="figure-simplified">The figure is simplified for a member with ${model.supports.length} supports and ${model.loads.length} loads: labels other than the peaks are left out; the tables give every value.</p>`);
  }
  out.push(figureBlock(figure, figureHeight(analysis, figure)));
  out.push(`<div class="columns">`);
  const [left, right] = columnLines(analysis);
  if (left <= right) {
    out.push(`<div>${inputs(model, notes, plain)}\n${method(analysis)}</div>`);
    out.push(results(analysis, plain));
  } else {
    out.push(inputs(model, notes, plain));
    out.push(`<div>${results(analysis, plain)}\n${method(analysis)}</div>`);
  }
  out.push(`</div>`);
  out.push(checks(analysis, plain, notes));
  if (notes.items.length > 0) {
    out.push(`<section class="notes" id="notes"><h2>Notes</h2><ol>${notes.items.map((n) => `<li>${escapeXml(n)}</li>`).join("")}</ol></section>`);
  }
  out.push(`</section>`);
  return out.join("\n");
}

function titleBlock(job: CalculationSheetJob, member: string, input: CalculationSheetInput | undefined, notes: Notes): string {
  const cell = (label: string, value: string | undefined, cls = ""): string =>
    `<td class="${cls}"><span class="label">${escapeXml(label)}</span><span class="value" data-field="${escapeXml(label.toLowerCase())}">${value === undefined || value === "" ? "&nbsp;" : notes.short(value)}</span></td>`;
  const digest = input === undefined ? undefined : sha256Hex(input.bytes);
  return (
    `<table class="title-block" id="title-block"><tbody>` +
    `<tr>${cell("Project", job.project, "wide")}${cell("Member", member)}${cell("Revision", job.revision)}</tr>` +
    `<tr>${cell("Engineer", job.engineer)}${cell("Checker", job.checker)}${cell("Date", job.date)}</tr>` +
    `<tr>${cell("Program", `flexura ${FLEXURA_VERSION}`)}${cell("Input file", input?.name)}<td><span class="label">SHA-256 of input</span><span class="value hash" data-field="sha-256">${digest ?? "&nbsp;"}</span></td></tr>` +
    `</tbody></table>`
  );
}

function q(value: number, unit: string, plain: boolean, digits = 4): string {
  return `${formatReportNumber(value, digits)}${unit === "" ? "" : `&nbsp;${escapeXml(printedUnit(unit, plain))}`}`;
}

function table(head: readonly string[], rows: readonly (readonly string[])[], cls = ""): string {
  return `<table class="data ${cls}"><thead><tr>${head.map((h) => `<th>${h}</th>`).join("")}</tr></thead><tbody>${rows.map((r) => `<tr>${r.map((c) => `<td>${c}</td>`).join("")}</tr>`).join("")}</tbody></table>`;
}

function spansOf(model: Model): string {
  const xs = [...new Set(model.supports.map((s) => s.at))].sort((a, b) => a - b);
  const u = model.units;
  const parts: string[] = [];
  if (xs.length > 0 && (xs[0] as number) > 0) parts.push(`cantilever ${formatReportNumber(xs[0] as number)}`);
  for (let i = 0; i + 1 < xs.length; i++) parts.push(formatReportNumber((xs[i + 1] as number) - (xs[i] as number)));
  if (xs.length > 0 && (xs[xs.length - 1] as number) < model.length) parts.push(`cantilever ${formatReportNumber(model.length - (xs[xs.length - 1] as number))}`);
  if (parts.length > 12) return `${parts.length} pieces between supports (see the supports table)`;
  return `${parts.join(" + ")} ${escapeXml(u.length)}`;
}

function loadCells(model: Model, l: ModelLoad, plain: boolean): readonly string[] {
  const u = model.units;
  switch (l.kind) {
    case "point":
      return ["point", `x = ${q(l.at, u.length, plain)}`, q(l.value, u.force, plain)];
    case "couple":
      return ["couple", `x = ${q(l.at, u.length, plain)}`, q(l.value, u.moment, plain)];
    case "distributed":
      return [
        l.start === l.end ? "uniform" : "linear",
        `${q(l.from, "", plain)} to ${q(l.to, u.length, plain)}`,
        l.start === l.end ? q(l.start, u.forcePerLength, plain) : `${q(l.start, "", plain)} to ${q(l.end, u.forcePerLength, plain)}`,
      ];
  }
}

function inputs(model: Model, notes: Notes, plain: boolean): string {
  const u = model.units;
  const out: string[] = [`<section id="inputs"><h2>2 Inputs</h2>`];
  const rows: string[][] = [["Length", q(model.length, u.length, plain)], ["Spans", spansOf(model)]];
  if (model.E !== undefined) rows.push(["E", q(model.E, u.modulus, plain)]);
  if (model.I !== undefined) rows.push(["I", q(model.I, u.secondMoment, plain)]);
  if (model.segments !== undefined && model.segments.length > 0) {
    rows.push(["Stiffness", model.segments.map((s) => `${q(s.from, "", plain)}–${q(s.to, u.length, plain)}: E&nbsp;${q(s.E, u.modulus, plain)}, I&nbsp;${q(s.I, u.secondMoment, plain)}`).join("<br>")]);
  }
  if (model.material !== undefined) {
    rows.push(["Material", `${model.material.name === undefined ? "" : `${notes.short(model.material.name)}, `}E ${q(model.material.E, u.modulus, plain)}${model.material.yieldStrength === undefined ? "" : `, f<sub>y</sub> ${q(model.material.yieldStrength, u.stress, plain)}`}`]);
  }
  if (model.section !== undefined) rows.push(["Section", escapeXml(sectionName(model))]);
  rows.push(["Units", escapeXml(`length ${printedUnit(u.length, plain)}, force ${printedUnit(u.force, plain)}, moment ${printedUnit(u.moment, plain)}, stress ${printedUnit(u.stress, plain)}, section ${printedUnit(u.sectionLength, plain)}`)]);
  out.push(`<table class="pairs">${rows.map(([k, v]) => `<tr><th>${k}</th><td>${v}</td></tr>`).join("")}</table>`);
  out.push(`<h3>Supports (numbered from 1, left to right as given)</h3>`);
  const supportRows = model.supports.map((s, i) => [
    String(i + 1),
    s.kind,
    q(s.at, u.length, plain),
    [s.stiffness === undefined ? "" : `k ${q(s.stiffness, u.translationalStiffness, plain)}`, s.rotationalStiffness === undefined ? "" : `k<sub>r</sub> ${q(s.rotationalStiffness, u.rotationalStiffness, plain)}`, s.settlement === undefined || s.settlement === 0 ? "" : `settles ${q(s.settlement, u.deflection, plain)}`, s.rotation === undefined || s.rotation === 0 ? "" : `turns ${q(s.rotation, u.rotation, plain)}`].filter((t) => t !== "").join(", "),
  ]);
  out.push(table(["#", "type", "at", "notes"], supportRows, model.supports.length > MANY_ROWS ? "many" : ""));
  if (model.hinges.length > 0) out.push(`<p>Hinges at x = ${model.hinges.map((h) => q(h, u.length, plain)).join(", ")}.</p>`);
  out.push(`<h3>Loads by case (forces down +, couples ccw +)</h3>`);
  if (model.loads.length === 0) out.push(`<p>No loads.</p>`);
  else {
    const byCase = new Map<string, ModelLoad[]>();
    for (const l of model.loads) {
      const key = l.case ?? "";
      const list = byCase.get(key);
      if (list === undefined) byCase.set(key, [l]);
      else list.push(l);
    }
    // One table, grouped by case in the order the cases first appear; loads numbered within their case.
    const rows: string[][] = [];
    for (const [name, loads] of byCase) loads.forEach((l, i) => rows.push([name === "" ? "(none)" : notes.short(name), String(i + 1), ...loadCells(model, l, plain)]));
    out.push(table(["case", "#", "type", "position", "value"], rows, model.loads.length > MANY_ROWS ? "many" : ""));
  }
  out.push(`<h3>Limits</h3><p>${limitsText(model, plain)}</p>`);
  out.push(`</section>`);
  return out.join("\n");
}

function sectionName(model: Model): string {
  const s = model.section as unknown as { shape?: unknown } | undefined;
  return typeof s?.shape === "string" ? s.shape : "built-up section";
}

function limitsText(model: Model, plain: boolean): string {
  const u = model.units;
  const l = model.limits;
  const parts: string[] = [];
  if (l.deflection !== undefined) parts.push(l.deflection.kind === "ratio" ? `deflection span/${formatReportNumber(l.deflection.ratio)}` : `deflection ${q(l.deflection.value, u.deflection, plain)}`);
  if (l.bendingStress !== undefined) parts.push(`allowable bending stress ${q(l.bendingStress, u.stress, plain)}`);
  if (l.shearStress !== undefined) parts.push(`allowable shear stress ${q(l.shearStress, u.stress, plain)}`);
  return parts.length === 0 ? "None given: nothing is checked." : parts.join("; ");
}

function results(analysis: ModelAnalysis, plain: boolean): string {
  const u = analysis.units;
  const out: string[] = [`<section id="results"><h2>3 Results</h2>`];
  const forceScale = analysis.reactions.reduce((s, r) => s + Math.abs(r.force), 0);
  const momentScale = analysis.reactions.reduce((s, r) => s + Math.abs(r.moment), 0) + forceScale * analysis.model.length;
  out.push(`<h3>Reactions (force up +, moment counterclockwise +)</h3>`);
  if (analysis.reactions.length > MANY_ROWS) {
    const up = analysis.reactions.reduce((a, b) => (b.force > a.force ? b : a));
    const down = analysis.reactions.reduce((a, b) => (b.force < a.force ? b : a));
    out.push(`<p class="summary">${analysis.reactions.length} supports; largest upward reaction ${q(up.force, u.force, plain)} at support ${up.support + 1} (x = ${q(up.at, u.length, plain)}); smallest ${q(down.force, u.force, plain)} at support ${down.support + 1}.</p>`);
  }
  out.push(
    table(
      ["support", "type", "at", "force", "moment"],
      analysis.reactions.map((r) => [String(r.support + 1), r.kind, q(r.at, u.length, plain), q(snapToZero(r.force, forceScale), u.force, plain), q(snapToZero(r.moment, momentScale), u.moment, plain)]),
      analysis.reactions.length > MANY_ROWS ? "many" : "",
    ),
  );
  out.push(`<h3>Peaks (M sagging +, slope ccw +, deflection up +)</h3>`);
  const peak = (name: string, p: ModelAnalysis["shear"], unit: string): string[] => {
    const ref = Math.max(Math.abs(p.max.value), Math.abs(p.min.value));
    return [name, q(snapToZero(p.max.value, ref), unit, plain), q(p.max.at, u.length, plain), q(snapToZero(p.min.value, ref), unit, plain), q(p.min.at, u.length, plain)];
  };
  out.push(
    table(
      ["quantity", "largest", "at x", "smallest", "at x"],
      [peak("shear V", analysis.shear, u.force), peak("moment M", analysis.moment, u.moment), peak("slope", analysis.slope, u.rotation), peak("deflection", analysis.deflection, u.deflection)],
    ),
  );
  const s = analysis.section;
  if (s !== undefined) {
    const ref = Math.sqrt(Math.abs(s.secondMomentZ * s.secondMomentY));
    out.push(`<h3>Section properties</h3>`);
    out.push(
      `<table class="pairs">` +
        [
          ["Area A", q(s.area, u.area, plain)],
          ["Centroid (z, y)", `${q(s.centroid.z, "", plain)}, ${q(s.centroid.y, u.sectionLength, plain)}`],
          ["I<sub>z</sub> (bending)", q(s.secondMomentZ, u.secondMoment, plain)],
          ["I<sub>y</sub>", q(s.secondMomentY, u.secondMoment, plain)],
          ["I<sub>yz</sub>", q(snapToZero(s.productMoment, ref), u.secondMoment, plain)],
          ["Extreme fibres y (top, bottom)", `${q(s.extremes.top, "", plain)}, ${q(s.extremes.bottom, u.sectionLength, plain)}`],
          ["S (top, bottom)", `${q(s.sectionModulus.top, "", plain)}, ${q(s.sectionModulus.bottom, u.sectionModulus, plain)}`],
        ]
          .map(([k, v]) => `<tr><th>${k}</th><td>${v}</td></tr>`)
          .join("") +
        `</table>`,
    );
  }
  const st = analysis.stress;
  if (st !== undefined) {
    out.push(`<h3>Stresses (tension positive)</h3>`);
    const rows: string[][] = [
      ["bending, tension", q(st.tension.value, u.stress, plain), q(st.tension.at, u.length, plain), `${q(st.tension.y, u.sectionLength, plain)}${st.tension.part === undefined ? "" : ` (part ${st.tension.part + 1})`}`],
      ["bending, compression", q(st.compression.value, u.stress, plain), q(st.compression.at, u.length, plain), `${q(st.compression.y, u.sectionLength, plain)}${st.compression.part === undefined ? "" : ` (part ${st.compression.part + 1})`}`],
    ];
    if (st.shear !== undefined) rows.push(["shear, largest", q(st.shear.value, u.stress, plain), q(st.shear.at, u.length, plain), q(st.shear.y, u.sectionLength, plain)]);
    for (const p of st.shearByPart ?? []) rows.push([`shear in part ${p.part + 1}`, q(p.value, u.stress, plain), q(p.at, u.length, plain), q(p.y, u.sectionLength, plain)]);
    out.push(table(["stress", "value", "at x", "fibre y"], rows));
    if (isMultiMaterial(analysis)) {
      const f = sectionStressFigure(analysis, { plainUnits: plain });
      if (f !== undefined) out.push(`<figure class="section-figure" id="section-figure">${f.svg}</figure>`);
    }
  }
  out.push(`</section>`);
  return out.join("\n");
}

/**
 * The printed height of the figure (mm), shrunk from 84 mm as the tables grow so that an ordinary
 * member still prints on one page: an estimate of the text lines of the taller column, the checks and
 * the list of unlabelled values, about 3 mm each at the sheet's type size, against what the page leaves.
 */
function figureHeight(analysis: ModelAnalysis, figure: CalculationFigure): number {
  const [left, right] = columnLines(analysis);
  const method = 10;
  const lines = Math.max(left + (left <= right ? method : 0), right + (left <= right ? 0 : method)) + analysis.checks.length + 4 + analysis.warnings.length;
  const unplaced = figure.unplaced.length === 0 ? 0 : Math.ceil(figure.unplaced.join("; ").length / 150);
  return Math.round(Math.max(58, Math.min(84, 84 - (lines + unplaced - 48) * 3.2)));
}

/** Whether the analysis's section has parts of more than one material (its stresses then differ by part). */
function isMultiMaterial(analysis: ModelAnalysis): boolean {
  return analysis.stress?.tension.part !== undefined || analysis.stress?.compression.part !== undefined || (analysis.stress?.shearByPart?.length ?? 0) > 0;
}

/** Estimated text lines of the inputs and the results columns, before the method statement. */
function columnLines(analysis: ModelAnalysis): readonly [number, number] {
  const model = analysis.model;
  const left = 16 + model.supports.length + model.loads.length + (model.segments?.length ?? 0) + (model.hinges.length > 0 ? 1 : 0);
  const stressRows = analysis.stress === undefined ? 0 : 4 + (analysis.stress.shearByPart?.length ?? 0);
  const right = 12 + analysis.reactions.length + (analysis.section === undefined ? 0 : 8) + stressRows + (isMultiMaterial(analysis) ? 17 : 0);
  return [left, right];
}

function figureBlock(figure: CalculationFigure, heightMm: number): string {
  const missing =
    figure.unplaced.length === 0
      ? ""
      : `<p class="unplaced">Values not labelled on the figure for want of room: ${figure.unplaced.map((t) => escapeXml(t)).join("; ")}.</p>`;
  return `<section id="figure"><h2>1 Figure</h2><figure style="--figure-height:${heightMm}mm">${figure.svg}<figcaption>Member, shear, moment and deflection on one x axis; faint guides carry supports, hinges and load positions down through the plots.</figcaption></figure>${missing}</section>`;
}

function checks(analysis: ModelAnalysis, plain: boolean, notes: Notes): string {
  const list: readonly ModelCheck[] = analysis.checks;
  const out: string[] = [`<section id="checks"><h2>5 Checks</h2>`];
  if (list.length === 0) {
    out.push(`<p class="verdict not-checked" data-verdict="not-checked"><strong>NOT CHECKED</strong>: the model gives no limits, so no check was run and no pass is claimed.</p>`);
  } else {
    const failed = list.filter((c) => !c.pass).length;
    const governing = list.reduce((a, b) => (b.utilisation > a.utilisation ? b : a));
    out.push(
      failed === 0
        ? `<p class="verdict pass" data-verdict="pass"><strong>PASS</strong>: ${list.length === 1 ? "the one check passes" : `all ${list.length} checks pass`}; the largest utilisation is ${utilisationText(governing.utilisation)} (${escapeXml(governing.description)}).</p>`
        : `<p class="verdict fail" data-verdict="fail"><strong>FAIL</strong>: ${list.length === 1 ? "the one check fails" : `${failed} of ${list.length} checks fail`}; the largest utilisation is ${utilisationText(governing.utilisation)} (${escapeXml(governing.description)}).</p>`,
    );
    out.push(
      table(
        ["#", "check", "demand", "limit", "utilisation", "verdict"],
        list.map((c, i) => [String(i + 1), notes.short(c.description), q(c.demand, c.unit, plain), q(c.capacity, c.unit, plain), utilisationText(c.utilisation), c.pass ? "pass" : "<strong>FAIL</strong>"]),
      ),
    );
  }
  if (analysis.warnings.length > 0) {
    out.push(`<h3>Warnings</h3><ul class="warnings">${analysis.warnings.map((w) => `<li><code>${escapeXml(w.code)}</code>: ${escapeXml(w.message)}</li>`).join("")}</ul>`);
  }
  out.push(`</section>`);
  return out.join("\n");
}

function method(analysis: ModelAnalysis): string {
  const hasSection = analysis.section !== undefined;
  return (
    `<section id="method"><h2>4 Method and limitations</h2>` +
    `<p>Elastic, first-order Euler–Bernoulli analysis of a straight member (plane sections, small deflections, no shear deformation): ` +
    `κ = M / (E I), σ = −M y / I, τ = V Q / (I b). Results are exact piecewise polynomials; peaks come from roots of their derivatives, not samples.</p>` +
    `<p>Not checked: lateral-torsional and local buckling, bearing, connections, vibration, fatigue, fire, second-order and dynamic effects${hasSection ? "" : ", stresses (no section given)"}; the loads are the user's.</p>` +
    `<p class="caution"><strong>${escapeXml(REPORT_CAUTION)}</strong></p>` +
    `</section>`
  );
}

function css(paper: "a4" | "letter"): string {
  return [
    `@page{size:${paper === "a4" ? "A4" : "letter"};margin:8mm 10mm}`,
    `html{font:6.9pt/1.2 "DejaVu Sans","Liberation Sans",Arial,sans-serif;color:#111}`,
    `body{margin:0}`,
    `.member{break-after:page;page-break-after:always}`,
    `.member:last-child{break-after:auto;page-break-after:auto}`,
    `h2{font-size:8.5pt;margin:3pt 0 1pt;border-bottom:0.6pt solid #111}`,
    `h3{font-size:7.4pt;margin:2.5pt 0 0.5pt}`,
    `p{margin:1pt 0}`,
    `table{border-collapse:collapse}`,
    `.data th,.data td{border-bottom:0.4pt solid #999;padding:0.3pt 3pt;text-align:left;vertical-align:top}`,
    `.data td{white-space:nowrap}`,
    `.data td.text{white-space:normal}`,
    `.data.many{font-size:6.5pt}`,
    `#checks .data{font-size:6.6pt}`,
    `.pairs th{text-align:left;font-weight:normal;color:#333;padding:0 6pt 0 0;vertical-align:top;white-space:nowrap}`,
    `.title-block{width:100%;border:1pt solid #111}`,
    `.title-block td{border:0.5pt solid #111;padding:0.8pt 4pt;vertical-align:top;overflow-wrap:anywhere}`,
    `.title-block .label{display:block;font-size:6pt;color:#444;text-transform:uppercase;letter-spacing:0.04em}`,
    `.title-block .value{display:block;min-height:9pt}`,
    `.hash{font-family:"DejaVu Sans Mono",monospace;font-size:6pt;overflow-wrap:anywhere}`,
    `.columns{display:grid;grid-template-columns:1fr 1fr;column-gap:10pt}`,
    `.columns section{min-width:0;overflow-wrap:anywhere}`,
    `figure{margin:2pt 0;break-inside:avoid}`,
    `figure svg{display:block;margin:0 auto;width:100%;height:auto;max-height:var(--figure-height,84mm)}`,
    `figcaption{font-size:6.5pt;color:#333}`,
    `.section-figure{margin:1pt 0}`,
    `.section-figure svg{max-height:46mm}`,
    `.verdict{font-size:9pt;margin-top:3pt}`,
    `.caution{margin-top:3pt}`,
    `.warning{border:0.6pt solid #111;padding:2pt}`,
    `.notes ol{margin:0;padding-left:14pt;overflow-wrap:anywhere}`,
    `@media screen{body{max-width:200mm;margin:8mm auto}}`,
  ].join("\n");
}
