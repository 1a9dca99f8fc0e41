// Packs the package once into .tmp/pack, then runs publint and are-the-types-wrong on that tarball,
// and checks the tarball holds no tests, benches, sources maps or stray files.
import { execFileSync } from "node:child_process";
import { mkdirSync, rmSync, readdirSync } from "node:fs";
import { join, resolve } from "node:path";

const root = resolve(import.meta.dirname, "..");
const out = join(root, ".tmp", "pack");
rmSync(out, { recursive: true, force: true });
mkdirSync(out, { recursive: true });
const json = execFileSync("npm", ["pack", "--json", "--pack-destination", out], { cwd: root, encoding: "utf8" });
const [info] = JSON.parse(json);
const tarball = join(out, readdirSync(out).find((f) => f.endsWith(".tgz")));
const bad = info.files.map((f) => f.path).filter((p) => /^(tests|bench|src|scripts|examples\/.*\.ts$)|\.map$|\.test\./.test(p));
if (bad.length > 0) {
  console.error(`pack-check: the tarball holds files users do not need:\n  ${bad.join("\n  ")}`);
  process.exit(1);
}
console.log(`pack-check: ${info.files.length} files, ${(info.size / 1024).toFixed(1)} KiB packed`);
const bin = (name) => join(root, "node_modules", ".bin", name);
execFileSync(bin("publint"), ["run", tarball, "--strict"], { stdio: "inherit" });
// Every resolution: node10 (legacy, through `typesVersions` for the subpaths), node16 ESM and CJS, bundler.
execFileSync(bin("attw"), [tarball], { stdio: "inherit" });
