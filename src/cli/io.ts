/**
 * Everything the command touches outside itself, handed in so that the logic stays pure and
 * testable; `node-io.ts` supplies the real file system and streams.
 */
export interface CliIo {
  /** Reads a UTF-8 text file; throws (with a Node `code` such as `ENOENT`, or `EFBIG` when too large) when it cannot. */
  readonly readText: (path: string) => string;
  /** Reads all of standard input as UTF-8 text (for the file name `-`); throws when it cannot. */
  readonly readStdin: () => string;
  /** Writes a UTF-8 text file, creating its folder first if needed; returns the file's path; throws when it cannot. */
  readonly writeText: (folder: string, name: string, text: string) => string;
  /** Writes to standard output. */
  readonly stdout: (text: string) => void;
  /** Writes to standard error. */
  readonly stderr: (text: string) => void;
  /** The package version, for `--version`. */
  readonly version: string;
}
