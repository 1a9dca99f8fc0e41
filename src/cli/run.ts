import { analysisToJson, modelSchema, type ModelAnalysis } from "../model/index.js";
import { calculationFigure, calculationSheet, figureDocument, formatReportNumber, reportDiagrams, textReport } from "../report/index.js";
import { parseCommandLine } from "./args.js";
import { EXIT, type ExitCode } from "./exit-codes.js";
import { HELP } from "./help.js";
import type { CliIo } from "./io.js";
import { displayName, loadAndAnalyze } from "./load.js";
import { fileFailure, usageFailure, type CliFailure } from "./problems.js";

export type { CliIo } from "./io.js";

/**
 * Runs the `flexura` command with the arguments after the command name and returns its exit
 * code (see `EXIT`). Never throws: every failure becomes a plain message on `io.stderr`, or, with
 * `--json`, one JSON object on `io.stdout` (`{ "ok": false, "exitCode", "problems": [...] }`).
 *
 * @example
 * ```ts
 * const code = runCli(["analyze", "beam.json"], io);
 * ```
 */
export function runCli(argv: readonly string[], io: CliIo): ExitCode {
  const json = argv.includes("--json");
  try {
    return dispatch(argv, io);
  } catch (e) {
    const what = e instanceof Error ? e.message : String(e);
    const message = `internal error: ${what}. This is a bug in flexura; please report it with the model file.`;
    try {
      if (json) io.stdout(`${JSON.stringify({ ok: false, exitCode: EXIT.internal, problems: [{ code: "internal-error", path: "", message }] })}\n`);
      else io.stderr(`flexura: ${message}\n`);
    } catch {
      // The streams themselves failed: the exit code is all that is left to say it.
    }
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
      if (argv.includes("--json")) return reportFailure(undefined, usageFailure(command.message), true, io);
      io.stderr(`flexura: ${command.message}\n\n${HELP[command.topic]}`);
      return EXIT.usage;
    case "schema":
      io.stdout(`${JSON.stringify(modelSchema, null, 2)}\n`);
      return EXIT.ok;
    case "analyze":
      return analyzeCommand(command.file, command.json, command.svg, io, command.html);
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
  if (code === EXIT.ok) return 0;
  if (code === EXIT.notChecked) return 1;
  if (code === EXIT.checkFailed) return 2;
  return 3 + code;
}

/** Says what failed: plain lines on stderr, or one JSON object on stdout with `--json`; returns the exit code. */
function reportFailure(file: string | undefined, failure: CliFailure, json: boolean, io: CliIo): ExitCode {
  if (json) {
    io.stdout(`${JSON.stringify({ ok: false, ...(file === undefined ? {} : { file }), exitCode: failure.exitCode, problems: failure.problems })}\n`);
  } else {
    io.stderr(failureText(file === undefined ? undefined : displayName(file), failure));
  }
  return failure.exitCode;
}

/** The plain-text form of a failure, as the command prints it on stderr. */
export function failureText(name: string | undefined, failure: CliFailure): string {
  const [only, ...more] = failure.problems;
  if (only !== undefined && more.length === 0 && only.path === "") {
    if (only.code === "json-syntax") return `flexura: ${name ?? "input"} is ${only.message}\n`;
    if (failure.writing === true) return `flexura: ${only.message}\n`;
    if (failure.exitCode === EXIT.file) return `flexura: cannot read ${name ?? "input"}: ${only.message}\n`;
    if (name === undefined) return `flexura: ${only.message}\n`;
    if (only.code.startsWith("file-")) return `flexura: ${name}: ${only.message}\n`;
  }
  const n = failure.problems.length;
  const head = n === 1 ? `flexura: ${name ?? "input"} has a problem:` : `flexura: ${name ?? "input"} has ${n} problems:`;
  const lines = failure.problems.map((p) => `  ${p.path === "" ? "(file)" : p.path}: ${p.message} [${p.code}]`);
  return `${head}\n${lines.join("\n")}\n`;
}

function baseName(file: string): string {
  if (file === "-") return "model";
  const last = file.split(/[\\/]/).pop() ?? file;
  return last.replace(/\.json$/i, "") || "model";
}

function analyzeCommand(file: string, json: boolean, svg: string | undefined, io: CliIo, html?: string): ExitCode {
  const loaded = loadAndAnalyze(file, io);
  if (!loaded.ok) return reportFailure(file, loaded.failure, json, io);
  const analysis = loaded.analysis;
  if (svg !== undefined) {
    const written: string[] = [];
    const drawings = [...reportDiagrams(analysis), { name: "figure", svg: figureDocument(calculationFigure(analysis)) }];
    for (const d of drawings) {
      const name = `${baseName(file)}-${d.name}.svg`;
      try {
        written.push(io.writeText(svg, name, d.svg));
      } catch (e) {
        const failure = fileFailure(e);
        const message = `cannot write ${name} in ${svg}: ${failure.problems[0]?.message ?? "unknown reason"}`;
        return reportFailure(file, { exitCode: EXIT.file, problems: [{ code: failure.problems[0]?.code ?? "file-unwritable", path: "", message }], writing: true }, json, io);
      }
    }
    io.stderr(`flexura: wrote ${written.length} diagrams: ${written.join(", ")}\n`);
  }
  const input = { name: file === "-" ? "standard input" : (file.split(/[\\/]/).pop() ?? file), bytes: loaded.text };
  if (html !== undefined) {
    const cut = Math.max(html.lastIndexOf("/"), html.lastIndexOf("\\"));
    const folder = cut < 0 ? "." : html.slice(0, cut) || "/";
    const name = html.slice(cut + 1);
    try {
      io.stderr(`flexura: wrote the calculation sheet ${io.writeText(folder, name, calculationSheet(analysis, { input }))}\n`);
    } catch (e) {
      const failure = fileFailure(e);
      const message = `cannot write ${html}: ${failure.problems[0]?.message ?? "unknown reason"}`;
      return reportFailure(file, { exitCode: EXIT.file, problems: [{ code: failure.problems[0]?.code ?? "file-unwritable", path: "", message }], writing: true }, json, io);
    }
  }
  io.stdout(json ? `${JSON.stringify(analysisToJson(analysis), null, 2)}\n` : textReport(analysis, { input }));
  return EXIT.ok;
}

function checkCommand(file: string, json: boolean, io: CliIo): ExitCode {
  const loaded = loadAndAnalyze(file, io);
  if (!loaded.ok) {
    if (!json) return reportFailure(file, loaded.failure, false, io);
    io.stdout(`${JSON.stringify(failedVerdict(file, loaded.failure))}\n`);
    return loaded.failure.exitCode;
  }
  const analysis = loaded.analysis;
  const verdict = compactVerdict(file, analysis);
  io.stdout(json ? `${JSON.stringify(verdict)}\n` : checkVerdict(file, analysis));
  return verdict.exitCode;
}

/**
 * The one-line JSON verdict `flexura check --json` writes per file: whether it was analysed (`ok`), whether
 * every check passed (`pass`), how many checks ran, the governing check and its utilisation, and the problems.
 */
export interface CompactVerdict {
  /** The file name as given (`-` for standard input). */
  readonly file: string;
  /** The model was read and analysed (no problems). */
  readonly ok: boolean;
  /** At least one check ran and every check passed (false when the model could not be analysed, and false with `checks: 0` when it gives no limits). */
  readonly pass: boolean;
  /** The exit code this file alone gives. */
  readonly exitCode: ExitCode;
  /** Number of checks run. */
  readonly checks: number;
  /** Description of the check with the highest utilisation, or null. */
  readonly governing: string | null;
  /** Its utilisation (demand / capacity, dimensionless), or null. */
  readonly utilisation: number | null;
  /** The failing checks' descriptions. */
  readonly failed: readonly string[];
  /** What stopped the analysis (empty when `ok`). */
  readonly problems: CliFailure["problems"];
}

/** The compact verdict of an analysed model. */
export function compactVerdict(file: string, analysis: ModelAnalysis): CompactVerdict {
  const checks = analysis.checks;
  const governing = governingCheck(analysis);
  const pass = checks.length > 0 && checks.every((c) => c.pass);
  return {
    file,
    ok: true,
    pass,
    exitCode: checks.length === 0 ? EXIT.notChecked : pass ? EXIT.ok : EXIT.checkFailed,
    checks: checks.length,
    governing: governing?.description ?? null,
    utilisation: governing?.utilisation ?? null,
    failed: checks.filter((c) => !c.pass).map((c) => c.description),
    problems: [],
  };
}

function failedVerdict(file: string, failure: CliFailure): CompactVerdict {
  return { file, ok: false, pass: false, exitCode: failure.exitCode, checks: 0, governing: null, utilisation: null, failed: [], problems: failure.problems };
}

function governingCheck(analysis: ModelAnalysis): ModelAnalysis["checks"][number] | undefined {
  let governing: ModelAnalysis["checks"][number] | undefined;
  for (const c of analysis.checks) if (governing === undefined || c.utilisation > governing.utilisation) governing = c;
  return governing;
}

/**
 * The verdict `flexura check` prints for one model: PASS or FAIL, how many checks, the governing
 * utilisation, and one line per failing check; NOT CHECKED when the model gives no limits.
 *
 * @example
 * ```ts
 * checkVerdict("beam.json", analysis); // "PASS beam.json: 3 checks, governing utilisation 0.82 (...)\n"
 * ```
 */
export function checkVerdict(file: string, analysis: ModelAnalysis): string {
  const checks = analysis.checks;
  const name = displayName(file);
  if (checks.length === 0) return `NOT CHECKED ${name}: the model gives no limits, so nothing was checked; add "limits" to check the member\n`;
  const failed = checks.filter((c) => !c.pass);
  const governing = governingCheck(analysis);
  const gov = governing === undefined ? "" : `, governing utilisation ${formatReportNumber(governing.utilisation, 3)} (${governing.description})`;
  if (failed.length === 0) return `PASS ${name}: ${checks.length} checks${gov}\n`;
  const lines = failed.map(
    (c) => `  FAIL ${c.description}: ${formatReportNumber(c.demand)} ${c.unit} against ${formatReportNumber(c.capacity)} ${c.unit} (utilisation ${formatReportNumber(c.utilisation, 3)})`,
  );
  return `FAIL ${name}: ${failed.length} of ${checks.length} checks fail${gov}\n${lines.join("\n")}\n`;
}
