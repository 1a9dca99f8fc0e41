// The centre-line (thin-walled) model of a section made of plates: straight walls with a
// thickness, joined at nodes. Checked here, and compiled into a graph (nodes, walls between
// them) that the shear-centre, warping and closed-cell torsion functions walk.
import { IssueCollector, describeValue, requireFinite } from "../errors/index.js";
import type { SectionPoint } from "./types.js";

/**
 * One straight wall of a thin-walled section: its centre line from `start` to `end` and its
 * thickness. A thickness of 0 is a link: it joins two plates that touch face to face (a cover
 * plate on a flange) and carries no area.
 *
 * @example
 * ```ts
 * const web: WallPlate = { start: { y: -145, z: 0 }, end: { y: 145, z: 0 }, thickness: 6 };
 * ```
 */
export interface WallPlate {
  /** One end of the centre line `{ y, z }` (length). */
  readonly start: SectionPoint;
  /** The other end of the centre line (length). */
  readonly end: SectionPoint;
  /** Wall thickness t (length), > 0; or 0 for a link that carries no area. */
  readonly thickness: number;
}

/**
 * A thin-walled section as the centre lines of its walls, the idealisation of thin-walled
 * beam theory: walls meet where their centre lines meet (a web runs to the middle of the
 * flange). Build one by hand, or from a section of plates with {@link centreLineModel}.
 *
 * @example
 * ```ts
 * // a channel: web on z = 0, flanges 100 long pointing to +z, 300 apart, 10 thick
 * const c: WallModel = { kind: "wall-model", plates: [
 *   { start: { y: 150, z: 100 }, end: { y: 150, z: 0 }, thickness: 10 },
 *   { start: { y: 150, z: 0 }, end: { y: -150, z: 0 }, thickness: 8 },
 *   { start: { y: -150, z: 0 }, end: { y: -150, z: 100 }, thickness: 10 },
 * ] };
 * ```
 */
export interface WallModel {
  /** Tag. */
  readonly kind: "wall-model";
  /** The walls. Centre lines that end on another wall's centre line (not only at its ends) are joined there. */
  readonly plates: readonly WallPlate[];
}

/** @internal A wall model as a graph: nodes (z, y) and edges between them, each with a thickness and the plate it came from. */
export interface WallGraph {
  readonly nodeZ: readonly number[];
  readonly nodeY: readonly number[];
  /** Edge e joins nodes from[e] and to[e]. */
  readonly from: readonly number[];
  readonly to: readonly number[];
  readonly thickness: readonly number[];
  readonly length: readonly number[];
  /** Index of the plate each edge belongs to (plates split at junctions give several edges). */
  readonly plate: readonly number[];
  /** Largest extent of the model, for tolerances. */
  readonly size: number;
}

function readPoint(found: IssueCollector, value: unknown, path: readonly (string | number)[]): SectionPoint | undefined {
  if (typeof value !== "object" || value === null) {
    found.add("point-invalid", path, `A point must be an object { y, z }; got ${describeValue(value)}.`);
    return undefined;
  }
  const p = value as { y?: unknown; z?: unknown };
  const okY = requireFinite(found, p.y, [...path, "y"], "y");
  const okZ = requireFinite(found, p.z, [...path, "z"], "z");
  return okY && okZ ? { y: p.y as number, z: p.z as number } : undefined;
}

/**
 * @internal Checks a wall model and compiles it into a graph: every plate with finite ends a
 * positive length apart and a thickness >= 0 (a link), at least one plate with thickness, all
 * of them connected. Plates are split where another plate's end lies on their centre line.
 *
 * @throws FlexuraError `wall-model-invalid`, `point-invalid`, `not-a-number`, `not-finite`,
 *   `wall-too-short`, `wall-thickness-negative`, `wall-model-no-area`, `walls-not-connected`.
 */
export function compileWallModel(model: WallModel): WallGraph {
  const found = new IssueCollector();
  const plates: unknown = typeof model === "object" && model !== null ? (model as { plates?: unknown }).plates : undefined;
  if (!Array.isArray(plates) || plates.length === 0) {
    found.add("wall-model-invalid", ["plates"], `A wall model is { kind: "wall-model", plates: [{ start, end, thickness }, ...] } with at least one plate; got ${describeValue(plates)}.`);
    found.throwIfAny();
  }
  const list = plates as readonly unknown[];
  const ends: { a: SectionPoint; b: SectionPoint; t: number }[] = [];
  list.forEach((raw, i) => {
    const path = ["plates", i];
    if (typeof raw !== "object" || raw === null) {
      found.add("wall-model-invalid", path, `A plate must be an object { start, end, thickness }; got ${describeValue(raw)}.`);
      return;
    }
    const r = raw as { start?: unknown; end?: unknown; thickness?: unknown };
    const a = readPoint(found, r.start, [...path, "start"]);
    const b = readPoint(found, r.end, [...path, "end"]);
    const okT = requireFinite(found, r.thickness, [...path, "thickness"], "thickness");
    if (okT && (r.thickness as number) < 0) found.add("wall-thickness-negative", [...path, "thickness"], `The wall thickness must be zero (a link) or more; got ${String(r.thickness)}.`, { value: r.thickness });
    if (a && b && okT) ends.push({ a, b, t: r.thickness as number });
  });
  found.throwIfAny();
  let size = 0;
  for (const e of ends) size = Math.max(size, Math.abs(e.a.y), Math.abs(e.a.z), Math.abs(e.b.y), Math.abs(e.b.z), Math.hypot(e.b.z - e.a.z, e.b.y - e.a.y));
  const tol = 1e-9 * size;
  ends.forEach((e, i) => {
    if (!(Math.hypot(e.b.z - e.a.z, e.b.y - e.a.y) > tol)) found.add("wall-too-short", ["plates", i], "The plate's two ends coincide: a wall needs a length.");
  });
  if (!ends.some((e) => e.t > 0)) found.add("wall-model-no-area", ["plates"], "Every plate is a link (thickness 0): at least one wall needs a thickness.");
  found.throwIfAny();
  // nodes: every end point, merged within the tolerance
  const nodeZ: number[] = [];
  const nodeY: number[] = [];
  const nodeOf = (p: SectionPoint): number => {
    for (let k = 0; k < nodeZ.length; k++) if (Math.abs(nodeZ[k]! - p.z) <= tol && Math.abs(nodeY[k]! - p.y) <= tol) return k;
    nodeZ.push(p.z);
    nodeY.push(p.y);
    return nodeZ.length - 1;
  };
  const endNodes = ends.map((e) => [nodeOf(e.a), nodeOf(e.b)] as const);
  const from: number[] = [];
  const to: number[] = [];
  const thickness: number[] = [];
  const length: number[] = [];
  const plate: number[] = [];
  ends.forEach((e, i) => {
    const [na, nb] = endNodes[i]!;
    const dz = e.b.z - e.a.z;
    const dy = e.b.y - e.a.y;
    const len2 = dz * dz + dy * dy;
    // nodes strictly inside this plate's centre line split it
    const inside: { s: number; k: number }[] = [];
    for (let k = 0; k < nodeZ.length; k++) {
      if (k === na || k === nb) continue;
      const s = ((nodeZ[k]! - e.a.z) * dz + (nodeY[k]! - e.a.y) * dy) / len2;
      if (!(s > 0 && s < 1)) continue;
      const off = Math.abs((nodeZ[k]! - e.a.z) * dy - (nodeY[k]! - e.a.y) * dz) / Math.sqrt(len2);
      if (off <= tol) inside.push({ s, k });
    }
    inside.sort((p, q) => p.s - q.s);
    const chain = [na, ...inside.map((x) => x.k), nb];
    for (let c = 0; c + 1 < chain.length; c++) {
      const u = chain[c]!;
      const v = chain[c + 1]!;
      from.push(u);
      to.push(v);
      thickness.push(e.t);
      length.push(Math.hypot(nodeZ[v]! - nodeZ[u]!, nodeY[v]! - nodeY[u]!));
      plate.push(i);
    }
  });
  // connected?
  const parent = nodeZ.map((_, k) => k);
  const root = (k: number): number => {
    while (parent[k] !== k) k = parent[k] = parent[parent[k]!]!;
    return k;
  };
  for (let e = 0; e < from.length; e++) parent[root(from[e]!)] = root(to[e]!);
  const groups = new Set(nodeZ.map((_, k) => root(k)));
  if (groups.size > 1) {
    const lonely = ends.findIndex((_, i) => root(endNodes[i]![0]) !== root(endNodes[0]![0]));
    found.add("walls-not-connected", ["plates", lonely], `The walls form ${groups.size} separate pieces: thin-walled beam theory needs one connected section (join touching plates where their centre lines meet).`, { pieces: groups.size });
    found.throwIfAny();
  }
  return { nodeZ, nodeY, from, to, thickness, length, plate, size };
}

/** @internal The number of independent closed cells (cycles) of a connected wall graph: edges - nodes + 1. */
export function cellCount(g: WallGraph): number {
  return g.from.length - g.nodeZ.length + 1;
}

/** @internal True for a {@link WallModel} (tagged `kind: "wall-model"`), false for anything else. */
export function isWallModel(value: unknown): value is WallModel {
  return typeof value === "object" && value !== null && (value as { kind?: unknown }).kind === "wall-model";
}
