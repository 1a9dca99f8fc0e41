import { bench, suite } from "./harness.js";
import { solveBeam } from "../src/beam/index.js";
import { evaluatePiecewiseMany } from "../src/math/index.js";
import { continuous, manyPointLoads, simpleSpan, threeSpans } from "./fixtures.js";

const members = new Map([10, 100, 1000, 10000].map((n) => [n, continuous(n)] as const));
const solved = solveBeam(simpleSpan);
const hundredLoads = manyPointLoads(100);
const points = new Float64Array(1_000_000).map((_, i) => (8 * i) / 999_999);
const out = new Float64Array(points.length);

suite("beam", () => {
  bench("beam: simple span, six mixed loads (reactions, peaks)", () => solveBeam(simpleSpan).peaks.deflection.min.value);
  bench("beam: three spans, ten loads (reactions, peaks)", () => solveBeam(threeSpans).peaks.moment.min.value);
  bench("beam: simple span, 100 point loads (one element, 100 pieces)", () => solveBeam(hundredLoads).peaks.moment.max.value);
  for (const [n, member] of members) bench(`beam: continuous member, ${n} spans`, () => solveBeam(member).reactions.length);
  bench("beam: moment at 1,000,000 sorted points", () => evaluatePiecewiseMany(solved.moment, points, out));
});
