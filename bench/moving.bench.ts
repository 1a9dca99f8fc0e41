// Influence lines and moving loads on an invented two-span runway girder (kN, m): 6 m + 6 m,
// continuous over the middle support, E I 42,000 kN m^2, under an invented four-wheel train (two
// end trucks of a small bridge crane): 40, 40, 55, 55 kN at 1.2, 2.8 and 1.2 m.
// The exact route: the member prepared once (its reaction lines), the largest sagging and hogging
// moments anywhere, and the exact envelopes of moment and shear at 1,000 stations (the curve itself
// is a polynomial only on determinate members: a simple span with the same train is measured too).
// Against stepping: the train at 1,000 positions (500 each way round), a solve at each, 1,000 stations.
import { bench, suite } from "./harness.js";
import { solveBeam, type BeamInput } from "../src/beam/index.js";
import { evaluatePiecewiseMany } from "../src/math/index.js";
import { absoluteMoments, envelopeAt, influenceLine, memberInfluence, movingEnvelopes, type Train } from "../src/moving/index.js";

export const GIRDER: BeamInput = {
  length: 12,
  stiffness: 42_000,
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }],
};
export const SIMPLE: BeamInput = { length: 8, stiffness: 42_000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 8 }] };
export const CRANE: Train = { loads: [40, 40, 55, 55], spacings: [1.2, 2.8, 1.2] };
const STATIONS = 1000;
const stations = (L: number): number[] => Array.from({ length: STATIONS }, (_, i) => (L * i) / (STATIONS - 1));
const xsGirder = stations(GIRDER.length);

/** The exact route on the two-span girder: prepare, absolute moments, envelopes of M and V at the stations. */
export function exactRoute() {
  const m = memberInfluence(GIRDER);
  return { absolute: absoluteMoments(m, CRANE), moment: envelopeAt(m, CRANE, "moment", xsGirder), shear: envelopeAt(m, CRANE, "shear", xsGirder) };
}

/** The exact route's envelopes as whole curves, on a determinate member (a simple span). */
export function exactCurvesSimple() {
  const m = memberInfluence(SIMPLE);
  return { absolute: absoluteMoments(m, CRANE), envelopes: movingEnvelopes(m, CRANE) };
}

/** Stepping: the train at `positions` positions (half each way round), solved at each, sampled at the stations. */
export function steppingRoute(beam: BeamInput, positions = 1000) {
  const L = beam.length;
  const T = CRANE.spacings.reduce((s, d) => s + d, 0);
  const xs = Float64Array.from(stations(L));
  const mMax = new Float64Array(STATIONS).fill(-Infinity);
  const mMin = new Float64Array(STATIONS).fill(Infinity);
  const vMax = new Float64Array(STATIONS).fill(-Infinity);
  const vMin = new Float64Array(STATIONS).fill(Infinity);
  const mv = new Float64Array(STATIONS);
  const vv = new Float64Array(STATIONS);
  const half = positions / 2;
  for (const o of [1, -1]) {
    for (let i = 0; i < half; i++) {
      const s = o === 1 ? -T + ((L + T) * i) / (half - 1) : ((L + T) * i) / (half - 1);
      let t = 0;
      const loads = CRANE.loads.flatMap((p, k) => {
        if (k > 0) t += CRANE.spacings[k - 1]!;
        const x = s + o * t;
        return x >= 0 && x <= L ? [{ kind: "point" as const, at: x, value: p }] : [];
      });
      const sol = solveBeam({ ...beam, loads });
      evaluatePiecewiseMany(sol.moment, xs, mv);
      evaluatePiecewiseMany(sol.shear, xs, vv);
      for (let j = 0; j < STATIONS; j++) {
        const a = mv[j]!;
        const b = vv[j]!;
        if (a > mMax[j]!) mMax[j] = a;
        if (a < mMin[j]!) mMin[j] = a;
        if (b > vMax[j]!) vMax[j] = b;
        if (b < vMin[j]!) vMin[j] = b;
      }
    }
  }
  return { mMax, mMin, vMax, vMin };
}

const prepared = memberInfluence(GIRDER);

/** The stepping route's worst miss against the exact one, for the record (printed by the bench). */
export function worstMiss(): string {
  const exact = exactRoute();
  const step = steppingRoute(GIRDER);
  let absStep = -Infinity;
  let absStepMin = Infinity;
  let miss = 0;
  let where = "";
  for (let j = 0; j < STATIONS; j++) {
    absStep = Math.max(absStep, step.mMax[j]!);
    absStepMin = Math.min(absStepMin, step.mMin[j]!);
    const checks: [number, number, string][] = [
      [exact.moment.max[j]!.value - step.mMax[j]!, exact.moment.max[j]!.value, "moment upper"],
      [step.mMin[j]! - exact.moment.min[j]!.value, exact.moment.min[j]!.value, "moment lower"],
      [exact.shear.max[j]!.value - step.vMax[j]!, exact.shear.max[j]!.value, "shear upper"],
      [step.vMin[j]! - exact.shear.min[j]!.value, exact.shear.min[j]!.value, "shear lower"],
    ];
    for (const [d, v, name] of checks) if (d > miss) [miss, where] = [d, `${name} at x = ${xsGirder[j]!.toFixed(3)}: ${(v - Math.sign(v) * d).toFixed(3)} against ${v.toFixed(3)} exact (${((100 * d) / Math.abs(v)).toFixed(3)} %)`];
  }
  const a = exact.absolute;
  return `moving: absolute moments exact ${a.max.value.toFixed(3)} at ${a.max.at.toFixed(3)} / ${a.min.value.toFixed(3)} at ${a.min.at.toFixed(3)}; stepping ${absStep.toFixed(3)} / ${absStepMin.toFixed(3)}; stepping's worst miss at the stations: ${where}`;
}

suite("moving", () => {
  bench("moving: memberInfluence (two spans: every reaction's line)", () => memberInfluence(GIRDER));
  bench("moving: influenceLine of the moment at 2.4 m (member prepared)", () => influenceLine(prepared, { kind: "moment", at: 2.4 }));
  bench("moving: influenceLine of the deflection at 3 m (one solve)", () => influenceLine(prepared, { kind: "deflection", at: 3 }));
  bench("moving: two spans, four axles: absolute moments (prepared in the call)", () => absoluteMoments(memberInfluence(GIRDER), CRANE));
  bench("moving: two spans, four axles: exact route (absolute moments, M and V envelopes at 1,000 stations)", () => exactRoute());
  bench("moving: simple span, four axles: exact envelope curves of M and V and absolute moments", () => exactCurvesSimple());
  bench("moving: two spans, four axles: stepping 1,000 positions x 1,000 stations", () => steppingRoute(GIRDER));
});
console.log(worstMiss());
