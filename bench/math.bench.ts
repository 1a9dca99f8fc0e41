import { bench, suite } from "./harness.js";
import {
  evaluatePiecewise,
  extremesOf,
  factorBandedSymmetric,
  piecewisePolynomial,
  rootsOf,
  solveBandedSymmetric,
} from "../src/math/index.js";

const quintic = piecewisePolynomial([0, 6], [-120, 274, -225, 85, -15, 1], 5);
const cubicPieces = piecewisePolynomial(
  Array.from({ length: 11 }, (_, i) => i),
  Array.from({ length: 40 }, (_, i) => Math.sin(i)),
  3,
);
const n = 2000;
const w = 3;
const template = new Float64Array(n * (w + 1));
for (let i = 0; i < n; i++) {
  template[i * (w + 1)] = 10;
  for (let j = 1; j <= w; j++) template[i * (w + 1) + j] = 1;
}
const band = new Float64Array(template.length);
const rhs = new Float64Array(n);

suite("math", () => {
  bench("math: evaluatePiecewise, ten cubic pieces", () => evaluatePiecewise(cubicPieces, 7.3));
  bench("math: rootsOf a quintic with five roots", () => rootsOf(quintic));
  bench("math: extremesOf ten cubic pieces", () => extremesOf(cubicPieces));
  bench("math: banded factor and solve, 2,000 unknowns, half-bandwidth 3", () => {
    band.set(template);
    rhs.fill(1);
    factorBandedSymmetric(band, n, w);
    return solveBandedSymmetric(band, n, w, rhs);
  });
});
