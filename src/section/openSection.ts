// Shear centre and warping constant of a thin-walled open section, from the sectorial
// coordinate of its centre-line model: exact integrals of piecewise-linear functions per wall.
import { attempt, fail, type Result } from "../errors/index.js";
import { centreLineModel } from "./centreLine.js";
import { cellCount, compileWallModel, isWallModel, type WallGraph, type WallModel } from "./wallModel.js";
import type { Section, SectionPoint } from "./types.js";

/**
 * One node of the centre-line model with its principal sectorial coordinate.
 *
 * @example
 * ```ts
 * const tip: SectorialPoint = openSectionProperties(model).nodes[0]!;
 * ```
 */
export interface SectorialPoint {
  /** Vertical coordinate of the node (length). */
  readonly y: number;
  /** Horizontal coordinate of the node (length). */
  readonly z: number;
  /**
   * The principal sectorial coordinate omega (length^2): twice the area swept by a ray from the
   * shear centre along the centre line, counterclockwise positive, less its mean (so that
   * integral of omega dA = 0). Warping stress under restrained torsion is proportional to it.
   */
  readonly sectorialCoordinate: number;
}

/**
 * Stability properties of a thin-walled open section, from its centre-line model.
 *
 * @example
 * ```ts
 * const p: OpenSectionProperties = openSectionProperties(channel({ depth: 300, flangeWidth: 100, flangeThickness: 10, webThickness: 8 }));
 * ```
 */
export interface OpenSectionProperties {
  /** Where the formulas hold: thin walls (each wall much thinner than it is long), an open section (no closed cell). */
  readonly validity: "thin-walled open";
  /** The shear centre `{ y, z }`, absolute (length): the point transverse loads must pass through for bending without twist. */
  readonly shearCentre: SectionPoint;
  /** Centroid of the centre-line model `{ y, z }`, absolute (length). */
  readonly centroid: SectionPoint;
  /** Shear centre minus centroid, `{ y, z }` (length): y_0 and z_0 of the stability formulas. */
  readonly shearCentreOffset: SectionPoint;
  /** Warping constant C_w = integral of omega^2 dA with the principal sectorial coordinate (length^6). */
  readonly warpingConstant: number;
  /** Area of the centre-line model, sum of t L (length^2). */
  readonly area: number;
  /** I_z of the centre-line model about its centroid (length^4). */
  readonly secondMomentZ: number;
  /** I_y of the centre-line model about its centroid (length^4). */
  readonly secondMomentY: number;
  /** I_yz of the centre-line model about its centroid (length^4). */
  readonly productMoment: number;
  /** The model's nodes (wall ends and junctions) with their principal sectorial coordinates. */
  readonly nodes: readonly SectorialPoint[];
}

/** integral over a wall of f g dA for f, g linear along it: t L (fa ga / 3 + (fa gb + fb ga) / 6 + fb gb / 3). */
function product(w: number, fa: number, fb: number, ga: number, gb: number): number {
  return w * ((fa * ga + fb * gb) / 3 + (fa * gb + fb * ga) / 6);
}

/** Sectorial coordinate at every node about the pole (pz, py), zero at node 0, by walking the tree of walls. */
function sectorial(g: WallGraph, pz: number, py: number): Float64Array {
  const n = g.nodeZ.length;
  const omega = new Float64Array(n);
  const seen = new Uint8Array(n);
  const adjacent: number[][] = Array.from({ length: n }, () => []);
  for (let e = 0; e < g.from.length; e++) {
    adjacent[g.from[e]!]!.push(e);
    adjacent[g.to[e]!]!.push(e);
  }
  const stack = [0];
  seen[0] = 1;
  while (stack.length > 0) {
    const a = stack.pop()!;
    for (const e of adjacent[a]!) {
      const b = g.from[e] === a ? g.to[e]! : g.from[e]!;
      if (seen[b]) continue;
      seen[b] = 1;
      // d omega = (z - z_P) dy - (y - y_P) dz, integrated along the straight wall a -> b
      omega[b] = omega[a]! + (g.nodeZ[a]! - pz) * (g.nodeY[b]! - g.nodeY[a]!) - (g.nodeY[a]! - py) * (g.nodeZ[b]! - g.nodeZ[a]!);
      stack.push(b);
    }
  }
  return omega;
}

/**
 * The shear centre and warping constant of a thin-walled open section (I, T, channel, angle,
 * Z, built-up sections of plates; doubly symmetric, monosymmetric or unsymmetric), by thin-walled
 * beam theory on the section's centre-line model: the sectorial coordinate omega is integrated
 * along the walls from a trial pole; the shear centre is the pole about which the sectorial
 * products integral of omega y dA and integral of omega z dA vanish, and C_w = integral of
 * omega^2 dA with omega measured from the shear centre and taken from its mean (Vlasov's theory
 * of thin-walled beams, as in Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., chapter
 * 5). Every integral is exact for the straight walls of the model.
 *
 * Valid for thin walls (each much thinner than it is long): the model counts the overlap of
 * walls at a junction twice and leaves out root fillets, as the thin-walled formulas do (for a
 * doubly symmetric I it gives C_w = I_y h_0^2 / 4 with h_0 between flange centre lines, the form
 * used for rolled-shape tables). Closed cells are refused: their warping is of another kind.
 *
 * @param input - A section of rectangular plates (converted by {@link centreLineModel}) or a
 *   {@link WallModel}.
 * @returns The shear centre, C_w and the model's properties.
 * @throws FlexuraError any code of {@link centreLineModel} for a section; `wall-model-invalid`,
 *   `walls-not-connected` and the other wall-model codes; `open-section-has-cell` when the walls
 *   close a cell (a tube or box: use {@link closedSectionTorsion} for its torsion constant).
 * @example
 * ```ts
 * const p = openSectionProperties(channel({ depth: 300, flangeWidth: 100, flangeThickness: 10, webThickness: 8 }));
 * p.shearCentre.z; // left of the web: the side away from the flanges
 * p.warpingConstant;
 * ```
 */
export function openSectionProperties(input: Section | WallModel): OpenSectionProperties {
  const model = isWallModel(input) ? input : centreLineModel(input);
  const g = compileWallModel(model);
  const cells = cellCount(g);
  if (cells > 0)
    fail("open-section-has-cell", ["plates"], `The walls close ${cells} cell${cells > 1 ? "s" : ""}: the shear centre and warping constant here are for open sections; use closedSectionTorsion for a tube or box.`, { cells });
  const m = g.from.length;
  let area = 0, sy = 0, sz = 0;
  for (let e = 0; e < m; e++) {
    const w = g.thickness[e]! * g.length[e]!;
    const a = g.from[e]!, b = g.to[e]!;
    area += w;
    sy += (w * (g.nodeY[a]! + g.nodeY[b]!)) / 2;
    sz += (w * (g.nodeZ[a]! + g.nodeZ[b]!)) / 2;
  }
  const yc = sy / area;
  const zc = sz / area;
  let iz = 0, iy = 0, iyz = 0;
  for (let e = 0; e < m; e++) {
    const w = g.thickness[e]! * g.length[e]!;
    const ya = g.nodeY[g.from[e]!]! - yc, yb = g.nodeY[g.to[e]!]! - yc;
    const za = g.nodeZ[g.from[e]!]! - zc, zb = g.nodeZ[g.to[e]!]! - zc;
    iz += product(w, ya, yb, ya, yb);
    iy += product(w, za, zb, za, zb);
    iyz += product(w, ya, yb, za, zb);
  }
  const det = iy * iz - iyz * iyz;
  if (!(det > 1e-12 * Math.max(iy * iy, iz * iz)))
    fail("open-section-is-line", ["plates"], "Every wall lies on one straight line: such a section has no bending stiffness about that line, and no shear centre off it.");
  // sectorial products about the centroid as trial pole
  const omega0 = sectorial(g, zc, yc);
  let iwy = 0, iwz = 0;
  for (let e = 0; e < m; e++) {
    const w = g.thickness[e]! * g.length[e]!;
    const a = g.from[e]!, b = g.to[e]!;
    iwy += product(w, omega0[a]!, omega0[b]!, g.nodeY[a]! - yc, g.nodeY[b]! - yc);
    iwz += product(w, omega0[a]!, omega0[b]!, g.nodeZ[a]! - zc, g.nodeZ[b]! - zc);
  }
  const dz = (iy * iwy - iyz * iwz) / det;
  const dy = (iyz * iwy - iz * iwz) / det;
  const shearZ = zc + dz;
  const shearY = yc + dy;
  const omega = sectorial(g, shearZ, shearY);
  let mean = 0;
  for (let e = 0; e < m; e++) mean += (g.thickness[e]! * g.length[e]! * (omega[g.from[e]!]! + omega[g.to[e]!]!)) / 2;
  mean /= area;
  for (let k = 0; k < omega.length; k++) omega[k]! -= mean;
  let cw = 0;
  for (let e = 0; e < m; e++) {
    const a = omega[g.from[e]!]!, b = omega[g.to[e]!]!;
    cw += product(g.thickness[e]! * g.length[e]!, a, b, a, b);
  }
  const nodes = Object.freeze(g.nodeZ.map((z, k) => Object.freeze({ y: g.nodeY[k]!, z, sectorialCoordinate: omega[k]! })));
  return Object.freeze({
    validity: "thin-walled open",
    shearCentre: Object.freeze({ y: shearY, z: shearZ }),
    centroid: Object.freeze({ y: yc, z: zc }),
    shearCentreOffset: Object.freeze({ y: dy, z: dz }),
    warpingConstant: cw,
    area,
    secondMomentZ: iz,
    secondMomentY: iy,
    productMoment: iyz,
    nodes,
  });
}

/**
 * The non-throwing form of {@link openSectionProperties}.
 *
 * @example
 * ```ts
 * const r = tryOpenSectionProperties(rectangularHollow({ width: 100, depth: 200, wallThickness: 8 }));
 * if (!r.ok) console.log(r.error.code); // "centre-line-hole"
 * ```
 */
export function tryOpenSectionProperties(input: Section | WallModel): Result<OpenSectionProperties> {
  return attempt(() => openSectionProperties(input));
}
