// What an engineer would otherwise script: a simple span discretised into two-node
// Euler-Bernoulli beam elements (cubic Hermite shape functions), assembled into a dense
// stiffness matrix and solved with a general-purpose matrix library. Benchmarks only.
import { Matrix, solve } from "ml-matrix";

/** Deflection (positive up) of a simple span under a full uniform downward load, by dense elements. */
export interface ElementModel {
  /** Nodal deflections and rotations, [v0, r0, v1, r1, ...]. */
  readonly displacements: Float64Array;
  /** Element length. */
  readonly elementLength: number;
}

export function solveByDenseElements(length: number, stiffness: number, load: number, elements: number): ElementModel {
  const n = elements + 1;
  const dof = 2 * n;
  const h = length / elements;
  const K = Matrix.zeros(dof, dof);
  const F = Matrix.zeros(dof, 1);
  const k = stiffness / h ** 3;
  const ke = [
    [12 * k, 6 * h * k, -12 * k, 6 * h * k],
    [6 * h * k, 4 * h * h * k, -6 * h * k, 2 * h * h * k],
    [-12 * k, -6 * h * k, 12 * k, -6 * h * k],
    [6 * h * k, 2 * h * h * k, -6 * h * k, 4 * h * h * k],
  ];
  // Consistent nodal loads for a downward uniform load (up positive).
  const fe = [(-load * h) / 2, (-load * h * h) / 12, (-load * h) / 2, (load * h * h) / 12];
  for (let e = 0; e < elements; e++) {
    const map = [2 * e, 2 * e + 1, 2 * e + 2, 2 * e + 3];
    for (let a = 0; a < 4; a++) {
      F.set(map[a]!, 0, F.get(map[a]!, 0) + fe[a]!);
      for (let b = 0; b < 4; b++) K.set(map[a]!, map[b]!, K.get(map[a]!, map[b]!) + ke[a]![b]!);
    }
  }
  // Pin at node 0 and roller at node n-1: zero deflection, imposed by replacing the rows.
  for (const d of [0, dof - 2]) {
    for (let j = 0; j < dof; j++) {
      K.set(d, j, 0);
      K.set(j, d, 0);
    }
    K.set(d, d, 1);
    F.set(d, 0, 0);
  }
  const u = solve(K, F);
  const displacements = new Float64Array(dof);
  for (let i = 0; i < dof; i++) displacements[i] = u.get(i, 0);
  return { displacements, elementLength: h };
}

/** Deflection of the element model at x, from the Hermite shape functions of the element holding x. */
export function elementDeflectionAt(model: ElementModel, x: number): number {
  const h = model.elementLength;
  const count = model.displacements.length / 2 - 1;
  const e = Math.min(count - 1, Math.max(0, Math.floor(x / h)));
  const s = (x - e * h) / h;
  const d = model.displacements;
  const v0 = d[2 * e]!;
  const r0 = d[2 * e + 1]!;
  const v1 = d[2 * e + 2]!;
  const r1 = d[2 * e + 3]!;
  const n1 = 1 - 3 * s * s + 2 * s ** 3;
  const n2 = h * (s - 2 * s * s + s ** 3);
  const n3 = 3 * s * s - 2 * s ** 3;
  const n4 = h * (-s * s + s ** 3);
  return n1 * v0 + n2 * r0 + n3 * v1 + n4 * r1;
}
