import { formatPath, isFlexuraError, type FlexuraError } from "../errors/index.js";
import { analysisToJson, analyzeModel, modelSchema, parseModel, type ModelAnalysis } from "../model/index.js";
import { formatReportNumber, reportDiagrams, textReport } from "../report/index.js";
import { parseCommandLine } from "./args.js";
import { EXIT, type ExitCode } from "./exit-codes.js";
import { HELP } from "./help.js";
import { readJsonText } from "./json-text.js";

/**
 * Everything the command touches outside itself, handed in so that the logic stays pure and
 * testable; `main.ts` supplies the real file system and streams.
 */
export interface CliIo {
  /** Reads a UTF-8 text file; throws (with a Node `code` such as `ENOENT`) when it cannot. */
  readonly readText: (path: string) => string;
  /** Writes a UTF-8 text file, creating its folder first if needed; throws when it cannot. */
  readonly writeText: (folder: string, name: string, text: string) => string;
  /** Writes to standard output. */
  readonly stdout: (text: string) => void;
  /** Writes to standard error. */
  readonly stderr: (text: string) => void;
  /** The package version, for `--version`. */
  readonly version: string;
}

/**
 * Runs the `flexura` command with the arguments after the command name and returns its exit
 * code (see `EXIT`). Never throws: every failure becomes a plain message on `io.stderr`.
 *
 * @example
 * ```ts
 * const code = runCli(["analyze", "beam.json"], io);
 * ```
 */
export function runCli(argv: readonly string[], io: CliIo): ExitCode {
  try {
    return dispatch(argv, io);
  } catch (e) {
    const what = e instanceof Error ? e.message : String(e);
    io.stderr(`flexura: internal error: ${what}\nThis is a bug in flexura; please report it with the model file.\n`);
    return EXIT.internal;
  }
}

function dispatch(argv: readonly string[], io: CliIo): ExitCode {
  const command = parseCommandLine(argv);
  switch (command.kind) {
    case "help":
      io.stdout(HELP[command.topic]);
      return EXIT.ok;
    case "version":
      io.stdout(`${io.version}\n`);
      return EXIT.ok;
    case "usage-error":
      io.stderr(`flexura: ${command.message}\n\n${HELP[command.topic]}`);
      return EXIT.usage;
    case "schema":
      io.stdout(`${JSON.stringify(modelSchema, null, 2)}\n`);
      return EXIT.ok;
    case "analyze":
      return analyzeCommand(command.file, command.json, command.svg, io);
    case "check": {
      let worst: ExitCode = EXIT.ok;
      for (const file of command.files) {
        const code = checkCommand(file, command.json, io);
        if (rank(code) > rank(worst)) worst = code;
      }
      return worst;
    }
  }
}

/** Orders exit codes by gravity, so that `check` over many files returns the worst. */
function rank(code: ExitCode): number {
  return code === EXIT.checkFailed ? 1 : code === EXIT.ok ? 0 : 2 + code;
}

type Loaded = { readonly ok: true; readonly analysis: ModelAnalysis } | { readonly ok: false; readonly code: ExitCode };

/** Reads, parses, validates and analyses one model file, reporting any failure on stderr. */
export function loadAndAnalyze(file: string, io: CliIo): Loaded {
  let text: string;
  try {
    text = io.readText(file);
  } catch (e) {
    io.stderr(`flexura: cannot read ${file}: ${fileProblem(e)}\n`);
    return { ok: false, code: EXIT.file };
  }
  const json = readJsonText(text);
  if (!json.ok) {
    const p = json.problem;
    io.stderr(`flexura: ${file} is not valid JSON: line ${p.line}, column ${p.column}: ${p.message}\n`);
    return { ok: false, code: EXIT.invalidModel };
  }
  try {
    return { ok: true, analysis: analyzeModel(parseModel(json.value)) };
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    io.stderr(modelProblems(file, e));
    return { ok: false, code: EXIT.invalidModel };
  }
}

/** Formats every issue of a model error as plain lines: `path: message [code]`. */
export function modelProblems(file: string, error: FlexuraError): string {
  const n = error.issues.length;
  const head = n === 1 ? `flexura: ${file} has a problem:` : `flexura: ${file} has ${n} problems:`;
  const lines = error.issues.map((i) => `  ${formatPath(i.path)}: ${i.message} [${i.code}]`);
  return `${head}\n${lines.join("\n")}\n`;
}

function fileProblem(e: unknown): string {
  const code = typeof e === "object" && e !== null ? (e as { code?: unknown }).code : undefined;
  switch (code) {
    case "ENOENT":
      return "no such file";
    case "EISDIR":
      return "it is a folder, not a file";
    case "EACCES":
    case "EPERM":
      return "permission denied";
    default:
      return e instanceof Error ? e.message : String(e);
  }
}

function baseName(file: string): string {
  const last = file.split(/[\\/]/).pop() ?? file;
  return last.replace(/\.json$/i, "") || "model";
}

function analyzeCommand(file: string, json: boolean, svg: string | undefined, io: CliIo): ExitCode {
  const loaded = loadAndAnalyze(file, io);
  if (!loaded.ok) return loaded.code;
  const analysis = loaded.analysis;
  io.stdout(json ? `${JSON.stringify(analysisToJson(analysis), null, 2)}\n` : textReport(analysis));
  if (svg === undefined) return EXIT.ok;
  const written: string[] = [];
  for (const d of reportDiagrams(analysis)) {
    const name = `${baseName(file)}-${d.name}.svg`;
    try {
      written.push(io.writeText(svg, name, d.svg));
    } catch (e) {
      io.stderr(`flexura: cannot write ${name} in ${svg}: ${fileProblem(e)}\n`);
      return EXIT.file;
    }
  }
  io.stderr(`flexura: wrote ${written.length} diagrams: ${written.join(", ")}\n`);
  return EXIT.ok;
}

function checkCommand(file: string, json: boolean, io: CliIo): ExitCode {
  const loaded = loadAndAnalyze(file, io);
  if (!loaded.ok) return loaded.code;
  const analysis = loaded.analysis;
  const verdict = analysis.checks.every((c) => c.pass) ? EXIT.ok : EXIT.checkFailed;
  if (json) {
    io.stdout(`${JSON.stringify(analysisToJson(analysis))}\n`);
    return verdict;
  }
  io.stdout(checkVerdict(file, analysis));
  return verdict;
}

/**
 * The verdict `flexura check` prints for one model: PASS or FAIL, how many checks, the governing
 * utilisation, and one line per failing check.
 *
 * @example
 * ```ts
 * checkVerdict("beam.json", analysis); // "PASS beam.json: 3 checks, governing utilisation 0.82 (...)\n"
 * ```
 */
export function checkVerdict(file: string, analysis: ModelAnalysis): string {
  const checks = analysis.checks;
  if (checks.length === 0) return `PASS ${file}: no limits given, nothing to check\n`;
  const failed = checks.filter((c) => !c.pass);
  let governing = checks[0];
  for (const c of checks) if (governing === undefined || c.utilisation > governing.utilisation) governing = c;
  const gov = governing === undefined ? "" : `, governing utilisation ${formatReportNumber(governing.utilisation, 3)} (${governing.description})`;
  if (failed.length === 0) return `PASS ${file}: ${checks.length} checks${gov}\n`;
  const lines = failed.map(
    (c) => `  FAIL ${c.description}: ${formatReportNumber(c.demand)} ${c.unit} against ${formatReportNumber(c.capacity)} ${c.unit} (utilisation ${formatReportNumber(c.utilisation, 3)})`,
  );
  return `FAIL ${file}: ${failed.length} of ${checks.length} checks fail${gov}\n${lines.join("\n")}\n`;
}
