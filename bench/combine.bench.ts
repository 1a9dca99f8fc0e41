// Combinations and envelopes of an invented three-span roof member (kN, m): dead, live patterned
// span by span, snow, wind reversible, under the ASCE 7-16 strength preset; all combinations and
// patterns, envelopes of shear, moment and deflection with the governing arrangement, and the
// reaction envelopes. Against the naive route: solve every arrangement separately and take the
// largest and smallest of 1,000 stations.
import { bench, suite } from "./harness.js";
import { solveBeam, type BeamInput } from "../src/beam/index.js";
import { evaluatePiecewiseMany } from "../src/math/index.js";
import type { Load } from "../src/loads/index.js";
import { arrangementsOf, envelopes, presetCombinations, solveCases, type LoadArrangement, type LoadCase } from "../src/combine/index.js";

export const ROOF: BeamInput = {
  length: 22,
  stiffness: 42_000, // kN m^2
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 7 }, { kind: "roller", at: 15 }, { kind: "roller", at: 22 }],
  loads: [
    { kind: "distributed", from: 0, to: 22, start: 4.2, end: 4.2, case: "D" },
    { kind: "point", at: 11, value: 9, case: "D" },
    { kind: "distributed", from: 0, to: 22, start: 6, end: 6, case: "L" },
    { kind: "distributed", from: 0, to: 15, start: 2.8, end: 2.8, case: "S" },
    { kind: "distributed", from: 15, to: 22, start: 2.8, end: 5.1, case: "S" },
    { kind: "distributed", from: 0, to: 22, start: -3.4, end: -3.4, case: "W" },
  ],
};
export const ROOF_CASES: readonly LoadCase[] = [
  { name: "D", category: "dead" },
  { name: "L", category: "live", patterned: true },
  { name: "S", category: "snow" },
  { name: "W", category: "wind", reversible: true },
];
const STATIONS = 1000;
const xs = Float64Array.from({ length: STATIONS }, (_, i) => (ROOF.length * i) / (STATIONS - 1));
const DIAGRAMS = ["shear", "moment", "deflection"] as const;

/** The flexura route: solve each case once, superpose, exact envelopes (the preset formed here too). */
export function exactRoute() {
  const solved = solveCases(ROOF, ROOF_CASES);
  const preset = presetCombinations("asce7-16-strength", ROOF_CASES);
  return envelopes(solved, preset.combinations, { diagrams: DIAGRAMS });
}

// A preset depends on the cases only: a schedule of members with the same cases forms it once.
const PRESET = presetCombinations("asce7-16-strength", ROOF_CASES);

/** The flexura route for one member of a schedule: the preset formed once for all members. */
export function exactRoutePerMember() {
  return envelopes(solveCases(ROOF, ROOF_CASES), PRESET.combinations, { diagrams: DIAGRAMS });
}

/** The loads of one arrangement, factored, a patterned case only on its loaded spans. */
function factoredLoads(a: LoadArrangement, factors: Readonly<Record<string, number>>, spans: readonly { from: number; to: number }[]): Load[] {
  const out: Load[] = [];
  for (const l of ROOF.loads ?? []) {
    const name = l.case ?? "default";
    const f = factors[name] ?? 0;
    if (f === 0 || l.kind !== "distributed") {
      if (f !== 0 && l.kind !== "distributed") out.push({ ...l, value: l.value * f });
      continue;
    }
    const loaded = a.pattern[name];
    if (loaded === undefined) {
      out.push({ ...l, start: l.start * f, end: l.end * f });
      continue;
    }
    for (const s of loaded) {
      const span = spans[s]!;
      const from = Math.max(l.from, span.from);
      const to = Math.min(l.to, span.to);
      if (!(to > from)) continue;
      const w = (x: number): number => l.start + ((l.end - l.start) * (x - l.from)) / (l.to - l.from);
      out.push({ kind: "distributed", from, to, start: w(from) * f, end: w(to) * f });
    }
  }
  return out;
}

/** The naive route: every arrangement solved on its own, extremes from 1,000 stations. */
export function naiveRoute() {
  const solved = solveCases(ROOF, ROOF_CASES); // for the list of arrangements only (spans, patterns)
  const preset = presetCombinations("asce7-16-strength", ROOF_CASES);
  const arrangements = arrangementsOf(solved, preset.combinations);
  const upper = DIAGRAMS.map(() => new Float64Array(STATIONS).fill(-Infinity));
  const lower = DIAGRAMS.map(() => new Float64Array(STATIONS).fill(Infinity));
  const values = new Float64Array(STATIONS);
  const reactions = ROOF.supports.map(() => ({ max: -Infinity, min: Infinity }));
  for (const a of arrangements) {
    const s = solveBeam({ ...ROOF, loads: factoredLoads(a, preset.combinations[a.combination]!.factors, solved.spans) });
    DIAGRAMS.forEach((d, i) => {
      evaluatePiecewiseMany(s[d], xs, values);
      const up = upper[i]!;
      const lo = lower[i]!;
      for (let j = 0; j < STATIONS; j++) {
        const v = values[j]!;
        if (v > up[j]!) up[j] = v;
        if (v < lo[j]!) lo[j] = v;
      }
    });
    s.reactions.forEach((r, k) => {
      reactions[k]!.max = Math.max(reactions[k]!.max, r.force);
      reactions[k]!.min = Math.min(reactions[k]!.min, r.force);
    });
  }
  return { arrangements, upper, lower, reactions };
}

/** How far the naive route's extremes fall short of the exact peaks, relative to each peak. */
export function naiveMisses(): { diagram: string; bound: string; exact: number; sampled: number; relative: number }[] {
  const exact = exactRoute();
  const naive = naiveRoute();
  const out: { diagram: string; bound: string; exact: number; sampled: number; relative: number }[] = [];
  DIAGRAMS.forEach((d, i) => {
    const e = exact[d]!;
    const up = Math.max(...naive.upper[i]!);
    const lo = Math.min(...naive.lower[i]!);
    out.push({ diagram: d, bound: "upper", exact: e.upper.peak.value, sampled: up, relative: Math.abs(e.upper.peak.value - up) / Math.abs(e.upper.peak.value) });
    out.push({ diagram: d, bound: "lower", exact: e.lower.peak.value, sampled: lo, relative: Math.abs(e.lower.peak.value - lo) / Math.abs(e.lower.peak.value) });
  });
  return out;
}

suite("combine", () => {
  const e = exactRoute();
  const worst = naiveMisses().reduce((a, b) => (b.relative > a.relative ? b : a));
  console.log(
    `combine: ${PRESET.combinations.length} combinations, ${e.arrangements.length} arrangements (combinations x patterns); ` +
      `naive route's worst miss at 1,000 stations: ${worst.diagram} ${worst.bound} ${worst.sampled.toPrecision(6)} against ${worst.exact.toPrecision(6)} exact (${(worst.relative * 100).toFixed(3)} %)`,
  );
  bench("combine: three spans, 4 cases, ASCE 7 strength, exact envelopes V M y + reactions", () => exactRoute());
  bench("combine: exact, one member of a schedule (preset formed once)", () => exactRoutePerMember());
  bench("combine: naive, the same (each arrangement solved, 1,000 stations)", () => naiveRoute());
});
