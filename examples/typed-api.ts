// Using flexura's typed API inside an app (Node or browser).
// Run (after `npm run build`; the examples import the package by name, as your code will): node node_modules/.bin/unrun examples/typed-api.ts
import { formatPath } from "flexura";
import { analyzeModel, tryParseModel, type ModelAnalysis } from "flexura/model";
import { textReport } from "flexura/report";

/** A member an app might build from its own screens: a timber joist over a 4.2 m span (invented). */
const joist = {
  name: "Deck joist J7",
  units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
  length: 4.2,
  section: { shape: "rectangle", width: 45, depth: 290 },
  material: { name: "graded timber", E: "10 GPa" },
  supports: [
    { at: 0, type: "pin" },
    { at: 4.2, type: "roller" },
  ],
  loads: [{ type: "distributed", from: 0, to: 4.2, start: 1.8 }],
  limits: { deflection: "span/300", bendingStress: "14 MPa" },
};

/** Returns the governing utilisation of a member, or the problems with its input as plain lines. */
export function governingUtilisation(input: unknown): { readonly ok: true; readonly utilisation: number; readonly analysis: ModelAnalysis } | { readonly ok: false; readonly problems: readonly string[] } {
  const parsed = tryParseModel(input);
  if (!parsed.ok) return { ok: false, problems: parsed.error.issues.map((i) => `${formatPath(i.path)}: ${i.message}`) };
  const analysis = analyzeModel(parsed.value);
  const utilisation = Math.max(0, ...analysis.checks.map((c) => c.utilisation));
  return { ok: true, utilisation, analysis };
}

const result = governingUtilisation(joist);
if (result.ok) {
  console.log(textReport(result.analysis));
  console.log(`Governing utilisation: ${result.utilisation.toFixed(3)}`);
  // Peaks come with their locations, in the model's units.
  const m = result.analysis.moment.max;
  console.log(`Peak sagging moment ${m.value.toFixed(2)} ${result.analysis.units.moment} at x = ${m.at} ${result.analysis.units.length}`);
} else {
  console.error(result.problems.join("\n"));
}

// A bad input reports every problem at once, with a path to each.
const broken = governingUtilisation({ ...joist, length: -1, loads: [{ type: "point", at: 9 }] });
if (!broken.ok) console.log(`\nA broken model, as an app would show it:\n  ${broken.problems.join("\n  ")}`);
