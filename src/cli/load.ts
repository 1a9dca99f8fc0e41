import { analyzeModel, parseModel, type ModelAnalysis } from "../model/index.js";
import type { CliIo } from "./io.js";
import { readJsonText } from "./json-text.js";
import { contentFailure, fileFailure, modelFailure, type CliFailure } from "./problems.js";

/** The file name that means standard input. */
export const STDIN_NAME = "-";

/**
 * The largest model file the command reads, in bytes (10 MiB). A model with thousands of loads is a few
 * hundred kilobytes; anything far larger is refused with `file-too-large` rather than read into memory.
 */
export const MAX_MODEL_FILE_BYTES = 10 * 1024 * 1024;

/** What reading and analysing one model gave: the analysis, or the failure with every problem. */
export type Loaded =
  | { readonly ok: true; readonly analysis: ModelAnalysis; readonly text: string }
  | { readonly ok: false; readonly failure: CliFailure };

/** How a file is named in messages: its path, or "standard input" for `-`. */
export function displayName(file: string): string {
  return file === STDIN_NAME ? "standard input" : file;
}

/** Reads, parses, validates and analyses one model file (or standard input for `-`). Never writes anything. */
export function loadAndAnalyze(file: string, io: CliIo): Loaded {
  let text: string;
  try {
    text = file === STDIN_NAME ? io.readStdin() : io.readText(file);
  } catch (e) {
    return { ok: false, failure: fileFailure(e) };
  }
  if (text.length > MAX_MODEL_FILE_BYTES) return { ok: false, failure: fileFailure({ code: "EFBIG" }) };
  if (text.includes("\u0000")) {
    return { ok: false, failure: contentFailure("file-not-text", "it is not a text file (it holds NUL bytes); a model file is JSON text") };
  }
  if (text.trim() === "") return { ok: false, failure: contentFailure("file-empty", "it is empty; a model file holds one JSON object") };
  const json = readJsonText(text);
  if (!json.ok) {
    const p = json.problem;
    return { ok: false, failure: contentFailure("json-syntax", `not valid JSON: line ${p.line}, column ${p.column}: ${p.message}`, { line: p.line, column: p.column }) };
  }
  try {
    return { ok: true, analysis: analyzeModel(parseModel(json.value)), text };
  } catch (e) {
    const failure = modelFailure(e);
    if (failure === undefined) throw e;
    return { ok: false, failure };
  }
}
