// A CliIo that keeps everything in memory, for driving runCli in tests.
import { readFileSync } from "node:fs";
import type { CliIo } from "../../src/cli/io.js";

export interface MemoryIo extends CliIo {
  readonly out: string[];
  readonly err: string[];
  readonly written: Map<string, string>;
}

/** Reads real files (the fixtures) unless `files` supplies the text; writes go to memory. */
export function memoryIo(files: Readonly<Record<string, string>> = {}, stdin = ""): MemoryIo {
  const out: string[] = [];
  const err: string[] = [];
  const written = new Map<string, string>();
  return {
    out,
    err,
    written,
    readText: (path) => (Object.hasOwn(files, path) ? files[path]! : readFileSync(path, "utf8")),
    readStdin: () => stdin,
    writeText: (folder, name, text) => {
      const file = `${folder}/${name}`;
      written.set(file, text);
      return file;
    },
    stdout: (text) => void out.push(text),
    stderr: (text) => void err.push(text),
    version: "9.9.9-test",
  };
}
