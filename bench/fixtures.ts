// Invented members for timing only, shared by the module benches and the targets table.
import type { BeamInput } from "../src/beam/index.js";
import type { Load } from "../src/loads/index.js";
import type { Support } from "../src/supports/index.js";

/** A simple span with six mixed loads: points, a couple, uniform and partial trapezoidal loads. */
export const simpleSpan: BeamInput = {
  length: 8,
  stiffness: 2.1e8 * 2.3e-4,
  supports: [
    { kind: "pin", at: 0 },
    { kind: "roller", at: 8 },
  ],
  loads: [
    { kind: "point", at: 2, value: 20 },
    { kind: "point", at: 5.5, value: 35 },
    { kind: "couple", at: 3, value: 12 },
    { kind: "distributed", from: 0, to: 8, start: 4, end: 4 },
    { kind: "distributed", from: 1, to: 6, start: 2, end: 9 },
    { kind: "distributed", from: 4, to: 7.5, start: 6, end: 0 },
  ],
};

/** Three continuous spans with ten loads. */
export const threeSpans: BeamInput = {
  length: 18,
  stiffness: 5e4,
  supports: [
    { kind: "pin", at: 0 },
    { kind: "roller", at: 6 },
    { kind: "roller", at: 12 },
    { kind: "roller", at: 18 },
  ],
  loads: [
    { kind: "distributed", from: 0, to: 18, start: 3, end: 3 },
    { kind: "point", at: 2, value: 10 },
    { kind: "point", at: 4.5, value: 8 },
    { kind: "point", at: 8, value: 12 },
    { kind: "point", at: 10.5, value: 6 },
    { kind: "point", at: 14, value: 15 },
    { kind: "point", at: 16, value: 9 },
    { kind: "couple", at: 9, value: 5 },
    { kind: "distributed", from: 13, to: 17, start: 2, end: 6 },
    { kind: "distributed", from: 1, to: 5, start: 4, end: 4 },
  ],
};

/** A continuous member of `spans` equal spans with a point load and a partial load on each. */
export function continuous(spans: number): BeamInput {
  const L = 5;
  const supports: Support[] = [{ kind: "pin", at: 0 }];
  const loads: Load[] = [];
  for (let i = 0; i < spans; i++) {
    supports.push({ kind: "roller", at: (i + 1) * L });
    loads.push({ kind: "point", at: i * L + 2, value: 10 + (i % 7) });
    loads.push({ kind: "distributed", from: i * L + 0.5, to: i * L + 4.5, start: 3, end: 5 });
  }
  return { length: spans * L, stiffness: 4e4, supports, loads };
}

/** A simple span carrying `count` point loads spread along it (a train of wheel loads, say). */
export function manyPointLoads(count: number): BeamInput {
  const L = 12;
  const loads: Load[] = [];
  for (let i = 0; i < count; i++) loads.push({ kind: "point", at: (L * (i + 0.5)) / count, value: 5 + (i % 3) });
  return {
    length: L,
    stiffness: 6e4,
    supports: [
      { kind: "pin", at: 0 },
      { kind: "roller", at: L },
    ],
    loads,
  };
}
