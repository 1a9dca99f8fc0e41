import type { ModelAnalysis } from "../model/index.js";
import { REPORT_CAUTION, wrapText } from "./caution.js";
import { reportInputs } from "./text-inputs.js";
import { reportChecks, reportForces, reportSection } from "./text-results.js";
import { sha256Hex } from "./document/sha256.js";
import { FLEXURA_VERSION } from "./document/version.js";

/** The input file a report was made from. */
export interface TextReportInput {
  /** The file's name as the user knows it. */
  readonly name: string;
  /** The file's bytes, or its text (hashed as UTF-8). */
  readonly bytes: Uint8Array | string;
}

/** Layout of the text report. */
export interface TextReportOptions {
  /** Width at which prose (the caution, the description) is wrapped; default 96 characters. */
  readonly width?: number;
  /** The input file the model was read from: its name and bytes, named and hashed (SHA-256) in the header. */
  readonly input?: TextReportInput;
}

/**
 * The readable plain-text report of an analysed model: heading (with the program version and, when
 * given, the input file's name and SHA-256), inputs echoed with their units,
 * reactions, peaks of shear, moment, slope and deflection with their locations, section
 * properties, extreme bending stresses, checks with utilisation and PASS/FAIL, warnings, and the
 * caution. Every value is in the model's own units, named beside it. Pure: no I/O.
 *
 * @param analysis - What `analyzeModel` returned.
 * @param options - Layout.
 * @returns The report, ending with a line feed.
 * @example
 * ```ts
 * const text = textReport(analyzeModel(parseModel(json)));
 * console.log(text);
 * ```
 */
export function textReport(analysis: ModelAnalysis, options: TextReportOptions = {}): string {
  const width = Math.max(40, options.width ?? 96);
  const model = analysis.model;
  const title = `flexura report: ${model.name ?? "unnamed member"}`;
  const source = options.input === undefined ? "" : `\nInput: ${options.input.name} (SHA-256 ${sha256Hex(options.input.bytes)})`;
  const parts: string[] = [`${title}\n${"=".repeat(Math.min(width, title.length))}\nProgram: flexura ${FLEXURA_VERSION}${source}`];
  if (model.description !== undefined) parts.push(wrapText(model.description, width));
  parts.push(wrapText(REPORT_CAUTION, width));
  parts.push(reportInputs(model), reportForces(analysis));
  const section = reportSection(analysis);
  if (section !== "") parts.push(section);
  parts.push(reportChecks(analysis));
  return `${parts.join("\n\n")}\n`;
}
