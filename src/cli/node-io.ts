// The real file system and streams for runCli: the only Node-specific code of the command.
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import type { CliIo } from "./io.js";
import { MAX_MODEL_FILE_BYTES } from "./load.js";

/**
 * The version of the installed flexura package, found by walking up from this file to the
 * nearest package.json named flexura; `"unknown"` when there is none.
 */
export function packageVersion(from: string = fileURLToPath(import.meta.url)): string {
  let dir = dirname(from);
  for (let i = 0; i < 6; i++) {
    const file = join(dir, "package.json");
    if (existsSync(file)) {
      const pkg = JSON.parse(readFileSync(file, "utf8")) as { name?: unknown; version?: unknown };
      if (pkg.name === "flexura" && typeof pkg.version === "string") return pkg.version;
    }
    dir = resolve(dir, "..");
  }
  return "unknown";
}

/** The {@link CliIo} of a real process: files on disk, process.stdout and process.stderr. */
export function nodeIo(): CliIo {
  return {
    readText: (path) => {
      const size = statSync(path).isFile() ? statSync(path).size : 0;
      if (size > MAX_MODEL_FILE_BYTES) throw Object.assign(new Error(`${path} is ${size} bytes`), { code: "EFBIG" });
      return readFileSync(path, "utf8");
    },
    readStdin: () => readFileSync(0, "utf8"),
    writeText: (folder, name, text) => {
      mkdirSync(folder, { recursive: true });
      const file = join(folder, name);
      writeFileSync(file, text, "utf8");
      return file;
    },
    stdout: (text) => void process.stdout.write(text),
    stderr: (text) => void process.stderr.write(text),
    version: packageVersion(),
  };
}
