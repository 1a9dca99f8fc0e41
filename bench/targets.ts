// `npm run bench:targets`: the performance targets, measured in one run, printed as a table
// against each target (docs/performance.md quotes it). Medians from mitata (p50).
import { bench, runAll } from "./harness.js";
import { solveBeam, evaluatePiecewiseMany, type BeamInput } from "../src/beam/entry.js";
import { continuous, simpleSpan as sixLoads, threeSpans } from "./fixtures.js";
import { section, sectionProperties, plasticProperties, type SectionPart } from "../src/section/index.js";
import { elementDeflectionAt, solveByDenseElements } from "./reference/dense-elements.js";

// --- the member of the element comparison -----------------------------------------------
const EI = 2.1e11 * 8.36e-5; // N*m^2, an invented steel member

// --- section ---------------------------------------------------------------------------------
const rect = (z0: number, y0: number, z1: number, y1: number, hole = false): SectionPart => ({
  kind: "polygon",
  points: [
    { z: z0, y: y0 },
    { z: z1, y: y0 },
    { z: z1, y: y1 },
    { z: z0, y: y1 },
  ],
  ...(hole ? { hole: true } : {}),
});
/** Ten parts: a welded girder with cover plates, stiffening strips, and two holes in the web. */
const tenPartParts: SectionPart[] = [
  rect(-150, 0, 150, 20), // bottom flange
  rect(-6, 20, 6, 580), // web
  rect(-150, 580, 150, 600), // top flange
  rect(-120, -12, 120, 0), // bottom cover plate
  rect(-120, 600, 120, 612), // top cover plate
  rect(6, 280, 60, 290), // strip right
  rect(-60, 280, -6, 290), // strip left
  rect(-140, 20, -130, 60), // lip left
  { kind: "circle", centre: { z: 0, y: 150 }, radius: 4, hole: true },
  { kind: "circle", centre: { z: 0, y: 450 }, radius: 4, hole: true },
];
export const tenParts = section(tenPartParts);
/**
 * The same parts as plain data, not made by `section()`: nothing is remembered for it, so every
 * call checks the parts, compiles their edges and integrates them (target 5a above measures a
 * section made by `section()`, whose parts were checked and integrated when it was made).
 */
const tenPartsPlain = { parts: tenPartParts };

// --- registration ------------------------------------------------------------------------------
const xs = new Float64Array(1_000_000);
const solvedThree = solveBeam(threeSpans);
for (let i = 0; i < xs.length; i++) xs[i] = (threeSpans.length * i) / (xs.length - 1);
const out = new Float64Array(xs.length);

bench("target 1: simple span, six mixed loads, reactions and peaks", () => solveBeam(sixLoads).peaks);
bench("target 2: three spans, ten loads, reactions and peaks", () => solveBeam(threeSpans).peaks);
const c100 = continuous(100);
const c10k = continuous(10_000);
bench("target 3a: continuous member, 100 spans", () => solveBeam(c100).peaks);
bench("target 3b: continuous member, 10,000 spans", () => solveBeam(c10k).peaks);
bench("target 4: moment at 1,000,000 points", () => evaluatePiecewiseMany(solvedThree.moment, xs, out));
bench("target 5a: ten-part section with two holes, elastic properties", () => sectionProperties(tenParts));
bench("target 5a-uncached: the same parts as plain data, checked and integrated on each call", () => sectionProperties(tenPartsPlain));
bench("target 5b: ten-part section with two holes, plastic modulus", () => plasticProperties(tenParts));
const uniform: BeamInput = {
  length: 10,
  stiffness: EI,
  supports: [
    { kind: "pin", at: 0 },
    { kind: "roller", at: 10 },
  ],
  loads: [{ kind: "distributed", from: 0, to: 10, start: 5e3, end: 5e3 }],
};
bench("target 6a: flexura, simple span under uniform load", () => solveBeam(uniform).peaks);
bench("target 6b: 200 dense beam elements (ml-matrix), same member", () => solveByDenseElements(10, EI, 5e3, 200));

const medians = await runAll(/^target/);
const m = (prefix: string): number => {
  for (const [k, v] of medians) if (k.startsWith(prefix)) return v;
  return Number.NaN;
};

// Errors against the closed form: simple span, full uniform load, deflection
// v(x) = -w x (L^3 - 2 L x^2 + x^3) / (24 E I) (AISC Steel Construction Manual, 15th ed., Table 3-23, case 1).
const closed = (x: number): number => (-5e3 * x * (1000 - 20 * x * x + x ** 3)) / (24 * EI);
const fe = solveByDenseElements(10, EI, 5e3, 200);
const exact = solveBeam(uniform);
let feError = 0;
let ourError = 0;
for (let i = 0; i <= 4000; i++) {
  const x = (10 * i) / 4000 + (i < 4000 ? 0.025 / 2 : 0); // between nodes as well as at them
  const ref = closed(Math.min(x, 10));
  feError = Math.max(feError, Math.abs(elementDeflectionAt(fe, Math.min(x, 10)) - ref));
  ourError = Math.max(ourError, Math.abs(evaluatePiecewiseMany(exact.deflection, [Math.min(x, 10)])[0]! - ref));
}
const peak = Math.abs(closed(5));
const us = (ns: number): string => `${(ns / 1e3).toFixed(2)} us`;
const ms = (ns: number): string => `${(ns / 1e6).toFixed(2)} ms`;
const rows: [string, string, string, boolean][] = [
  ["1. simple span, six mixed loads", "<= 5 us", us(m("target 1")), m("target 1") <= 5e3],
  ["2. three spans, ten loads", "<= 15 us", us(m("target 2")), m("target 2") <= 15e3],
  ["3. 10,000 spans", "<= 50 ms", ms(m("target 3b")), m("target 3b") <= 50e6],
  ["3. ratio 10,000 / 100 spans", "<= 150", (m("target 3b") / m("target 3a")).toFixed(1), m("target 3b") / m("target 3a") <= 150],
  ["4. moment evaluations per second", ">= 50 M/s", `${(1e6 / (m("target 4") / 1e9) / 1e6).toFixed(0)} M/s`, 1e6 / (m("target 4") / 1e9) >= 50e6],
  ["5. ten-part section, elastic properties", "<= 3 us", us(m("target 5a:")), m("target 5a:") <= 3e3],
  ["5. the same, uncached (checks, compile, integration)", "<= 3 us", us(m("target 5a-uncached")), m("target 5a-uncached") <= 3e3],
  ["5. ten-part section, plastic modulus", "<= 30 us", us(m("target 5b")), m("target 5b") <= 30e3],
  ["6. dense elements / flexura time", ">= 100", (m("target 6b") / m("target 6a")).toFixed(0), m("target 6b") / m("target 6a") >= 100],
  ["6. max deflection error, flexura / peak", "exact", (ourError / peak).toExponential(1), ourError / peak < 1e-12],
  ["6. max deflection error, 200 elements / peak", "(reported)", (feError / peak).toExponential(1), true],
];
console.log("\n| target | goal | measured (median) | met |\n| --- | --- | --- | --- |");
for (const [name, goal, got, ok] of rows) console.log(`| ${name} | ${goal} | ${got} | ${ok ? "yes" : "NO"} |`);
