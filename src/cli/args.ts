import { parseArgs } from "node:util";
import { closestName } from "../errors/index.js";

/** A command line, understood. */
export type CliCommand =
  | { readonly kind: "help"; readonly topic: "main" | "analyze" | "check" | "schema" }
  | { readonly kind: "version" }
  | { readonly kind: "analyze"; readonly file: string; readonly json: boolean; readonly svg: string | undefined; readonly html?: string }
  | { readonly kind: "check"; readonly files: readonly string[]; readonly json: boolean }
  | { readonly kind: "schema" }
  | { readonly kind: "usage-error"; readonly message: string; readonly topic: "main" | "analyze" | "check" | "schema" };

const COMMANDS = ["analyze", "check", "schema"] as const;

/**
 * Reads the arguments after `flexura` into a command. Never throws: a wrong command line comes
 * back as `{ kind: "usage-error" }` with a plain message.
 *
 * @example
 * ```ts
 * parseCommandLine(["analyze", "beam.json", "--json"]); // { kind: "analyze", file: "beam.json", json: true, svg: undefined }
 * ```
 */
export function parseCommandLine(argv: readonly string[]): CliCommand {
  const [first, ...rest] = argv;
  if (first === undefined) return usage("Give a command: analyze, check or schema.", "main");
  if (first === "--help" || first === "-h" || first === "help") return { kind: "help", topic: "main" };
  if (first === "--version" || first === "-v") return rest.length === 0 ? { kind: "version" } : usage("--version takes no arguments.", "main");
  const command = COMMANDS.find((c) => c === first);
  if (command === undefined) {
    const what = first.startsWith("-") ? `Unknown option "${first}".` : `Unknown command "${first}".`;
    const near = first.startsWith("-") ? undefined : closestName(first, COMMANDS);
    const hint = near === undefined ? "" : ` Did you mean "${near}"?`;
    return usage(`${what}${hint} The commands are: analyze, check, schema.`, "main");
  }
  let parsed: { values: Record<string, string | boolean | undefined>; positionals: string[] };
  try {
    parsed = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: {
        help: { type: "boolean", short: "h" },
        ...(command === "schema" ? {} : { json: { type: "boolean" } }),
        ...(command === "analyze" ? { svg: { type: "string" }, html: { type: "string" } } : {}),
      },
    });
  } catch (e) {
    return usage(e instanceof Error ? e.message.split(". To specify")[0] ?? e.message : String(e), command);
  }
  const { values, positionals } = parsed;
  if (values.help === true) return { kind: "help", topic: command };
  switch (command) {
    case "schema":
      return positionals.length === 0 ? { kind: "schema" } : usage("schema takes no file names.", command);
    case "analyze": {
      const [file, ...extra] = positionals;
      if (file === undefined) return usage("Give the model file to analyse: flexura analyze MODEL.json", command);
      if (extra.length > 0) return usage(`analyze takes one model file; got ${positionals.length}. Use check for many.`, command);
      const svg = values.svg;
      if (svg === "") return usage("--svg needs a folder name.", command);
      const html = values.html;
      if (html === "" || (typeof html === "string" && /[\\/]$/.test(html))) return usage("--html needs a file name, such as sheet.html.", command);
      return { kind: "analyze", file, json: values.json === true, svg: typeof svg === "string" ? svg : undefined, ...(typeof html === "string" ? { html } : {}) };
    }
    case "check":
      if (positionals.length === 0) return usage("Give at least one model file: flexura check MODEL.json", command);
      return { kind: "check", files: positionals, json: values.json === true };
  }
}

function usage(message: string, topic: "main" | "analyze" | "check" | "schema"): CliCommand {
  return { kind: "usage-error", message, topic };
}
