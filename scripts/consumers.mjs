// The consumer compile matrix: a TypeScript file that imports the package and every subpath, compiled against
// the installed tarball under each moduleResolution users have (node10, node16, nodenext, bundler), from ESM and
// from CommonJS. Called by smoke.mjs with the folder where the tarball is installed.
import { execFileSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { join } from "node:path";

const SOURCE = `import { solveBeam, isFlexuraError, iSection, sectionProperties, type BeamSolution } from "flexura";
import { evaluatePiecewise } from "flexura/beam";
import { parseModel, analyzeModel, type ModelAnalysis } from "flexura/model";
import { textReport } from "flexura/report";
import { extremeBendingStresses } from "flexura/stress";
import { rectangle } from "flexura/section";
import { checkMember } from "flexura/check";
import { parseQuantity, type Quantity } from "flexura/units";
import { sheetFunctions, type SheetValue } from "flexura/sheet";
import { checkSteelBeam, type SteelBeamCheck } from "flexura/design";
import { presetCombinations, type Combination } from "flexura/combine";
import { influenceLine, type MemberInfluence } from "flexura/moving";
const s: BeamSolution = solveBeam({ length: 4, stiffness: 1, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }], loads: [{ kind: "point", at: 2, value: 1 }] });
const m: number = evaluatePiecewise(s.moment, 2);
const a: ModelAnalysis | undefined = undefined as ModelAnalysis | undefined;
const q: Quantity = parseQuantity("1 kN", "force");
const sv: SheetValue | undefined = sheetFunctions[0]?.call();
const sb: SteelBeamCheck | undefined = undefined as SteelBeamCheck | undefined;
const il = influenceLine({ length: 4, stiffness: 1, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }] }, { kind: "moment", at: 2 });
const mi: MemberInfluence | undefined = undefined as MemberInfluence | undefined;
const cb: readonly Combination[] = presetCombinations("asce7-16-strength", [{ name: "D", category: "dead" }]).combinations;
export const used = [il, mi, m, a, q, sv, sb, checkSteelBeam, cb, isFlexuraError, iSection, sectionProperties, parseModel, analyzeModel, textReport, extremeBendingStresses, rectangle, checkMember];
`;

/** Each row: a name, the compiler options, the source file's extension, and the package type around it. */
const MATRIX = [
  ["node10, CommonJS", { module: "commonjs", moduleResolution: "node10" }, ".ts", "commonjs"],
  ["node16, ESM", { module: "node16", moduleResolution: "node16" }, ".mts", "module"],
  ["node16, CommonJS", { module: "node16", moduleResolution: "node16" }, ".cts", "module"],
  ["nodenext, ESM", { module: "nodenext", moduleResolution: "nodenext" }, ".mts", "module"],
  ["nodenext, CommonJS", { module: "nodenext", moduleResolution: "nodenext" }, ".cts", "module"],
  ["bundler, ESM", { module: "esnext", moduleResolution: "bundler" }, ".ts", "module"],
];

/** Compiles the consumer under every row of the matrix in `dir` (which has flexura installed); throws on the first failure. */
export function compileConsumers(dir, tsc) {
  for (const [name, options, ext, type] of MATRIX) {
    const file = `consumer-${name.replace(/[^a-z0-9]+/gi, "-")}${ext}`;
    writeFileSync(join(dir, file), SOURCE);
    const config = join(dir, `tsconfig.${file}.json`);
    writeFileSync(
      config,
      JSON.stringify({ compilerOptions: { strict: true, target: "ES2022", noEmit: true, skipLibCheck: false, types: [], resolveJsonModule: true, ...options }, files: [file] }),
    );
    writeFileSync(join(dir, "package.json"), JSON.stringify({ name: "consumer", private: true, type }));
    try {
      execFileSync("node", [tsc, "-p", config], { cwd: dir, stdio: "pipe", encoding: "utf8" });
    } catch (e) {
      throw new Error(`consumer compile failed under ${name}:\n${e.stdout ?? ""}${e.stderr ?? ""}`);
    }
    console.log(`smoke typescript ok: ${name}`);
  }
  writeFileSync(join(dir, "package.json"), JSON.stringify({ name: "smoke", private: true, type: "module" }));
}
