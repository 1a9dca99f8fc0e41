import { formatPath, isFlexuraError } from "../errors/index.js";
import { EXIT, type ExitCode } from "./exit-codes.js";

/**
 * One thing that stopped the command from analysing a file (or from starting), in the same shape as the
 * library's issues: a stable kebab-case `code`, the `path` to the offending field (`""` for the whole file),
 * and a plain message. A JSON syntax error also gives its `line` and `column` (1-based).
 */
export interface CliProblem {
  /** Stable kebab-case code: the library's issue codes, or one of the command's own (docs/cli.md). */
  readonly code: string;
  /** Path to the offending field, such as `loads[2].at`; `""` for the file as a whole. */
  readonly path: string;
  /** A plain message a user can act on. */
  readonly message: string;
  /** Line of a JSON syntax error (1-based). */
  readonly line?: number;
  /** Column of a JSON syntax error (1-based). */
  readonly column?: number;
}

/** A failure: the exit code it leads to and every problem found. */
export interface CliFailure {
  /** The exit code this failure gives (see `EXIT`). */
  readonly exitCode: ExitCode;
  /** Every problem found, at least one. */
  readonly problems: readonly CliProblem[];
  /** Set when the failure came from writing output rather than reading the model. */
  readonly writing?: true;
}

/** The failure for a file that could not be read: the reason in plain words, from Node's error code. */
export function fileFailure(error: unknown): CliFailure {
  const code = typeof error === "object" && error !== null ? (error as { code?: unknown }).code : undefined;
  const [problem, message] = FILE_REASONS.get(typeof code === "string" ? code : "") ?? ["file-unreadable", error instanceof Error ? error.message : String(error)];
  return { exitCode: EXIT.file, problems: [{ code: problem, path: "", message }] };
}

/** Plain reasons for the system errors a user meets, with the command's codes for them. */
const IN_THE_WAY = ["file-in-the-way", "a file of that name is where a folder is needed; give a new folder name or an existing folder"] as const;
const FILE_REASONS: ReadonlyMap<string, readonly [string, string]> = new Map<string, readonly [string, string]>([
  ["ENOENT", ["file-not-found", "no such file"]],
  ["EISDIR", ["file-is-folder", "it is a folder, not a file"]],
  ["EACCES", ["file-permission-denied", "permission denied"]],
  ["EPERM", ["file-permission-denied", "permission denied"]],
  ["EFBIG", ["file-too-large", "it is larger than a model file may be"]],
  ["EEXIST", IN_THE_WAY],
  ["ENOTDIR", IN_THE_WAY],
]);

/** The failure for a library error: every issue with its code and formatted path; exit 4 (invalid model). */
export function modelFailure(error: unknown): CliFailure | undefined {
  if (!isFlexuraError(error)) return undefined;
  return {
    exitCode: EXIT.invalidModel,
    problems: error.issues.map((i) => ({ code: i.code, path: i.path.length === 0 ? "" : formatPath(i.path), message: i.message })),
  };
}

/** The failure for content that is not a model file at all (empty, binary); exit 4. */
export function contentFailure(code: string, message: string, position?: { line: number; column: number }): CliFailure {
  return { exitCode: EXIT.invalidModel, problems: [{ code, path: "", message, ...(position ?? {}) }] };
}

/** The failure for a wrong command line; exit 2. */
export function usageFailure(message: string): CliFailure {
  return { exitCode: EXIT.usage, problems: [{ code: "usage", path: "", message }] };
}
