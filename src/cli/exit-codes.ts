/**
 * Exit codes of the `flexura` command, for scripts and CI. They are part of the public
 * interface: changing one is a breaking change.
 */
export const EXIT = {
  /** Everything worked; for `check`, every check passed. */
  ok: 0,
  /** `check` only: the analysis ran and at least one check failed. */
  checkFailed: 1,
  /** The command line was wrong: unknown command or option, missing or extra argument. */
  usage: 2,
  /** A file could not be read or written (missing, a folder, no permission). */
  file: 3,
  /** The model file is not valid JSON, not a valid model, or describes a member that cannot be solved. */
  invalidModel: 4,
  /** An unexpected failure inside flexura: a bug to report. */
  internal: 5,
  /**
   * `check` only: the model was analysed but gives no limits, so nothing was checked and no pass
   * is claimed (a verdict never passes by default).
   */
  notChecked: 6,
} as const;

/** One of the exit codes in {@link EXIT}. */
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];
