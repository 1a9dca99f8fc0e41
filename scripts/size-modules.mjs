// Per-module size (docs/performance.md quotes it): each module's public index bundled on its own
// from source with what it imports, minified and gzipped, decimal.js excluded. Modules share code
// (errors, math), so the figures overlap and do not add up to the main entry's.
// Usage: node scripts/size-modules.mjs
import { readdirSync, existsSync } from "node:fs";
import { gzipSync } from "node:zlib";
import { resolve } from "node:path";
import { rolldown } from "rolldown";

const root = resolve(import.meta.dirname, "..");
const modules = readdirSync(resolve(root, "src"), { withFileTypes: true })
  .filter((d) => d.isDirectory() && existsSync(resolve(root, "src", d.name, "index.ts")))
  .map((d) => d.name);
console.log("| module | minified | gzipped |\n| --- | ---: | ---: |");
for (const name of ["(main entry) index.ts", ...modules]) {
  const input = name.startsWith("(") ? resolve(root, "src/index.ts") : resolve(root, "src", name, "index.ts");
  const bundle = await rolldown({ input, external: ["decimal.js", /^node:/], platform: "neutral", logLevel: "silent" });
  const { output } = await bundle.generate({ format: "esm", minify: true });
  const code = output.map((o) => (o.type === "chunk" ? o.code : "")).join("");
  const kib = (n) => `${(n / 1024).toFixed(1)} KiB`;
  console.log(`| ${name} | ${kib(code.length)} | ${kib(gzipSync(code, { level: 9 }).length)} |`);
}
