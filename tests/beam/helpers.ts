import { expect } from "vitest";
import type { BeamSolution } from "../../src/beam/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";

/** Expects |actual - expected| <= rel * max(|expected|, scale). */
export function near(actual: number, expected: number, rel = 1e-9, scale = 0): void {
  const tol = rel * Math.max(Math.abs(expected), scale);
  if (!(Math.abs(actual - expected) <= tol)) expect.fail(`expected ${actual} to be within ${tol} of ${expected}`);
}

/** Deflection at x (up positive). */
export function deflectionAt(s: BeamSolution, x: number): number {
  return evaluatePiecewise(s.deflection, x);
}

/** Moment at x (sagging positive). */
export function momentAt(s: BeamSolution, x: number, side?: "left" | "right"): number {
  return evaluatePiecewise(s.moment, x, side);
}
