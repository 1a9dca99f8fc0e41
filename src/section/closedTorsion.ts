// St Venant torsion constant of thin-walled closed sections with one or more cells (Bredt-Batho),
// with the open walls that branch off them added as sum of L t^3 / 3.
import { attempt, fail, type Result } from "../errors/index.js";
import { cellCount, compileWallModel, type WallModel } from "./wallModel.js";

/**
 * The torsion constant of a thin-walled closed section and how it was found.
 *
 * @example
 * ```ts
 * const t: ClosedSectionTorsion = closedSectionTorsion(box);
 * ```
 */
export interface ClosedSectionTorsion {
  /** Where the formula holds: thin walls (each much thinner than the cell is wide), one or more closed cells. */
  readonly validity: "thin-walled closed";
  /** St Venant torsion constant J (length^4): the cells' Bredt-Batho part plus sum of L t^3 / 3 over the open walls. */
  readonly torsionConstant: number;
  /** The number of independent closed cells. */
  readonly cells: number;
  /** The cells' part of J, 2 sum of q_i A_i with the shear flows for a unit G theta (length^4). */
  readonly cellPart: number;
  /** The open walls' part of J, sum of L t^3 / 3 over the walls on no cell (length^4). */
  readonly openPart: number;
}

/** Solves the small dense system a x = b (a symmetric positive definite) by Gaussian elimination with partial pivoting; `a` is row-major n x n and is overwritten. */
function solveDense(a: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let k = 0; k < n; k++) {
    let pivot = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i * n + k]!) > Math.abs(a[pivot * n + k]!)) pivot = i;
    if (pivot !== k) {
      for (let j = 0; j < n; j++) [a[k * n + j], a[pivot * n + j]] = [a[pivot * n + j]!, a[k * n + j]!];
      [b[k], b[pivot]] = [b[pivot]!, b[k]!];
    }
    for (let i = k + 1; i < n; i++) {
      const f = a[i * n + k]! / a[k * n + k]!;
      for (let j = k; j < n; j++) a[i * n + j]! -= f * a[k * n + j]!;
      b[i]! -= f * b[k]!;
    }
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= a[i * n + j]! * x[j]!;
    x[i] = s / a[i * n + i]!;
  }
  return x;
}

/**
 * The St Venant torsion constant J of a thin-walled closed section with one or more cells (a
 * tube, a box, a multi-cell box girder), by the Bredt-Batho theory of thin-walled tubes: the
 * shear flow q_i of each independent cell is constant around it; compatibility of each cell,
 * sum over its walls of q L / t = 2 A_i G theta (the flow in a wall shared by two cells is the
 * difference of theirs), gives the flows, and J = 2 sum of q_i A_i / (G theta) (Timoshenko and
 * Goodier, Theory of Elasticity, 3rd ed., section 115; Roark's Formulas for Stress and Strain,
 * table of torsion constants, thin-walled tubes). For one cell this is 4 A^2 / (integral of ds / t).
 * Walls on no cell (the outstands of a box girder's flanges) add L t^3 / 3 each; the walls of
 * the cells add nothing more (their own open-section part is negligible when they are thin).
 * Cells are any independent set of closed paths through the walls, so the result does not
 * depend on how the walls are listed.
 *
 * Valid for thin walls; for a solid circle or a circular tube use {@link torsionConstantExact}.
 *
 * @param model - The centre lines of the walls ({@link WallModel}); a closed path of walls is a cell.
 * @returns J and its parts.
 * @throws FlexuraError the wall-model codes (`wall-model-invalid`, `walls-not-connected`, ...);
 *   `closed-section-no-cell` when the walls close no cell (an open section: see
 *   {@link openSectionProperties} and {@link torsionConstantThinWalled}); `closed-section-link-in-cell`
 *   when a cell runs through a link of thickness 0 (it cannot carry the shear flow).
 * @example
 * ```ts
 * // a 200 x 100 box (centre lines), walls 10 and 6 thick: J = 2 t1 t2 a^2 b^2 / (a t2 + b t1)
 * closedSectionTorsion({ kind: "wall-model", plates: [
 *   { start: { y: 50, z: -100 }, end: { y: 50, z: 100 }, thickness: 10 },
 *   { start: { y: 50, z: 100 }, end: { y: -50, z: 100 }, thickness: 6 },
 *   { start: { y: -50, z: 100 }, end: { y: -50, z: -100 }, thickness: 10 },
 *   { start: { y: -50, z: -100 }, end: { y: 50, z: -100 }, thickness: 6 },
 * ] }).torsionConstant;
 * ```
 */
export function closedSectionTorsion(model: WallModel): ClosedSectionTorsion {
  const g = compileWallModel(model);
  const cells = cellCount(g);
  if (cells === 0)
    fail("closed-section-no-cell", ["plates"], "The walls close no cell: this is an open section, whose torsion constant is sum of L t^3 / 3 (torsionConstantThinWalled) and whose shear centre and warping constant come from openSectionProperties.");
  const nodes = g.nodeZ.length;
  const m = g.from.length;
  // spanning tree from node 0; each wall off the tree closes one cell
  const parentEdge = new Int32Array(nodes).fill(-1);
  const depth = new Int32Array(nodes).fill(-1);
  const adjacent: number[][] = Array.from({ length: nodes }, () => []);
  for (let e = 0; e < m; e++) {
    adjacent[g.from[e]!]!.push(e);
    adjacent[g.to[e]!]!.push(e);
  }
  const inTree = new Uint8Array(m);
  depth[0] = 0;
  const queue = [0];
  for (let h = 0; h < queue.length; h++) {
    const a = queue[h]!;
    for (const e of adjacent[a]!) {
      const b = g.from[e] === a ? g.to[e]! : g.from[e]!;
      if (depth[b] !== -1) continue;
      depth[b] = depth[a]! + 1;
      parentEdge[b] = e;
      inTree[e] = 1;
      queue.push(b);
    }
  }
  const other = (e: number, k: number): number => (g.from[e] === k ? g.to[e]! : g.from[e]!);
  // each cell as signed walls: +1 when walked from -> to
  const cellWalls: Map<number, number>[] = [];
  for (let e = 0; e < m; e++) {
    if (inTree[e]) continue;
    const walls = new Map<number, number>([[e, 1]]);
    // walk from the wall's end back to its start through the tree: to -> ... -> from
    let a = g.to[e]!;
    let b = g.from[e]!;
    const fromA: [number, number][] = [];
    const fromB: [number, number][] = [];
    while (a !== b) {
      if (depth[a]! >= depth[b]!) {
        const pe = parentEdge[a]!;
        const next = other(pe, a);
        fromA.push([pe, g.from[pe] === a ? 1 : -1]);
        a = next;
      } else {
        const pe = parentEdge[b]!;
        const next = other(pe, b);
        // walked later in reverse (towards b): from next to b
        fromB.push([pe, g.from[pe] === next ? 1 : -1]);
        b = next;
      }
    }
    for (const [w, s] of fromA) walls.set(w, s);
    for (const [w, s] of fromB) walls.set(w, s);
    cellWalls.push(walls);
  }
  const area = new Float64Array(cells);
  const f = new Float64Array(cells * cells);
  cellWalls.forEach((walls, i) => {
    let twice = 0;
    for (const [w, s] of walls) {
      if (!(g.thickness[w]! > 0))
        fail("closed-section-link-in-cell", ["plates", g.plate[w]!], "A cell runs through this link (a wall of thickness 0), which cannot carry the cell's shear flow: give the wall its thickness.");
      const a = s > 0 ? g.from[w]! : g.to[w]!;
      const b = s > 0 ? g.to[w]! : g.from[w]!;
      twice += g.nodeZ[a]! * g.nodeY[b]! - g.nodeZ[b]! * g.nodeY[a]!;
    }
    area[i] = twice / 2;
    cellWalls.forEach((others, j) => {
      let sum = 0;
      for (const [w, s] of walls) {
        const t = others.get(w);
        if (t !== undefined) sum += (s * t * g.length[w]!) / g.thickness[w]!;
      }
      f[i * cells + j] = sum;
    });
  });
  const rhs = new Float64Array(cells);
  for (let i = 0; i < cells; i++) rhs[i] = 2 * area[i]!;
  const q = solveDense(f, rhs, cells);
  let cellPart = 0;
  for (let i = 0; i < cells; i++) cellPart += 2 * q[i]! * area[i]!;
  const onCell = new Uint8Array(m);
  for (const walls of cellWalls) for (const w of walls.keys()) onCell[w] = 1;
  let openPart = 0;
  for (let e = 0; e < m; e++) if (!onCell[e]) openPart += (g.length[e]! * g.thickness[e]! ** 3) / 3;
  return Object.freeze({ validity: "thin-walled closed", torsionConstant: cellPart + openPart, cells, cellPart, openPart });
}

/**
 * The non-throwing form of {@link closedSectionTorsion}.
 *
 * @example
 * ```ts
 * const r = tryClosedSectionTorsion({ kind: "wall-model", plates: [{ start: { y: 0, z: 0 }, end: { y: 0, z: 100 }, thickness: 5 }] });
 * if (!r.ok) console.log(r.error.code); // "closed-section-no-cell"
 * ```
 */
export function tryClosedSectionTorsion(model: WallModel): Result<ClosedSectionTorsion> {
  return attempt(() => closedSectionTorsion(model));
}
