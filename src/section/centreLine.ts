// From a section of rectangular plates to its centre-line (thin-walled) model: each plate becomes
// its centre line with its thickness; a plate whose end sits on another plate's face is carried on
// to that plate's centre line; a flush corner's overhang is trimmed; plates face to face are linked.
import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { normalisedPolygon } from "./edges.js";
import { prepareSection } from "./prepare.js";
import type { Section } from "./types.js";
import type { WallModel, WallPlate } from "./wallModel.js";

/** The least ratio of a plate's length to its thickness that the thin-walled model accepts. */
const SLENDER = 2;

interface Plate {
  /** Part index. */
  readonly part: number;
  /** Centre-line start (z, y) and unit direction (uz, uy), length, thickness. */
  readonly az: number;
  readonly ay: number;
  readonly uz: number;
  readonly uy: number;
  readonly length: number;
  readonly t: number;
}

/** The centre line of a rectangular polygon, or undefined when the polygon is not a rectangle. */
function plateOf(points: readonly { readonly y: number; readonly z: number }[], part: number): Plate | undefined {
  const { zs, ys } = normalisedPolygon(points);
  if (zs.length !== 4) return undefined;
  const corner = (i: number): [number, number] => [zs[i % 4]!, ys[i % 4]!];
  const side = (i: number): [number, number] => [corner(i + 1)[0] - corner(i)[0], corner(i + 1)[1] - corner(i)[1]];
  const a = side(0), b = side(1), c = side(2);
  const la = Math.hypot(...a), lb = Math.hypot(...b);
  const square = Math.abs(a[0] * b[0] + a[1] * b[1]) <= 1e-9 * la * lb;
  const parallel = Math.abs(a[0] + c[0]) <= 1e-9 * la && Math.abs(a[1] + c[1]) <= 1e-9 * la;
  if (!square || !parallel) return undefined;
  const mid = (i: number, j: number): [number, number] => [(corner(i)[0] + corner(j)[0]) / 2, (corner(i)[1] + corner(j)[1]) / 2];
  // centre line along the longer pair of sides, from the middle of one short side to the other
  const [s, e, length, t] = la >= lb ? [mid(0, 3), mid(1, 2), la, lb] : [mid(0, 1), mid(3, 2), lb, la];
  return { part, az: s[0], ay: s[1], uz: (e[0] - s[0]) / length, uy: (e[1] - s[1]) / length, length, t };
}

/**
 * The centre-line model of a section made of rectangular plates (any orientation): each plate
 * becomes its centre line with its thickness (the shorter side). Where the end of one plate sits
 * on the face of a perpendicular plate (a web under a flange), its centre line is carried on to
 * the other's centre line; where that junction is flush with the other plate's end (the heel of
 * an angle, the back of a channel), the other's overhang beyond the junction is trimmed, so the
 * model has the centre-line dimensions of thin-walled beam theory (for a channel, flanges of
 * b_f - t_w / 2 and a web of d - t_f). Plates that touch face to face (a cover plate on a flange)
 * are joined by a link (a wall of thickness 0) at the middle of the faces they share. Root
 * fillets are left out, as the thin-walled idealisation does.
 *
 * @param section - A section of rectangular plates and fillets, without holes.
 * @returns The {@link WallModel}.
 * @throws FlexuraError any code of `section()`; `centre-line-hole` (a hole: tubes and boxes are
 *   closed sections), `centre-line-part-not-plate` (a part that is neither a rectangle nor a
 *   fillet), `centre-line-plate-not-thin` (a plate less than twice as long as it is thick: the
 *   thin-walled model does not describe it).
 * @example
 * ```ts
 * const model = centreLineModel(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 }));
 * model.plates.length; // 3: two flanges and a web running from one flange's centre line to the other's
 * ```
 */
export function centreLineModel(section: Section): WallModel {
  const prepared = prepareSection(section);
  const found = new IssueCollector();
  const plates: Plate[] = [];
  section.parts.forEach((part, i) => {
    if (part.hole === true) {
      found.add("centre-line-hole", ["parts", i], "The centre-line model is for open sections of plates; this section has a hole (a tube or box is a closed section: see closedSectionTorsion).");
      return;
    }
    if (part.kind === "fillet") return;
    const plate = part.kind === "polygon" ? plateOf(part.points, i) : undefined;
    if (!plate) {
      found.add("centre-line-part-not-plate", ["parts", i], `Only rectangular plates (and fillets, which the thin-walled model leaves out) make a centre-line model; this part is a ${part.kind === "polygon" ? "polygon that is not a rectangle" : part.kind}.`);
      return;
    }
    if (plate.length < SLENDER * plate.t)
      found.add("centre-line-plate-not-thin", ["parts", i], `The plate is ${plate.length} long and ${plate.t} thick: the thin-walled model needs plates at least ${SLENDER} times as long as they are thick.`, { length: plate.length, thickness: plate.t });
    plates.push(plate);
  });
  found.throwIfAny();
  const box = prepared.box;
  const tol = 1e-9 * Math.max(box[1]! - box[0]!, box[3]! - box[2]!, Math.abs(prepared.refZ), Math.abs(prepared.refY));
  const n = plates.length;
  // start and end extension of each plate's centre line (negative trims), and junctions landing on it
  const grow = plates.map(() => [0, 0]);
  const landed: { on: number; s: number; t: number }[] = [];
  const free = plates.map(() => [true, true]);
  for (let p = 0; p < n; p++) {
    const P = plates[p]!;
    for (let side = 0; side < 2; side++) {
      const out = side === 0 ? -1 : 1;
      const ez = P.az + (side === 0 ? 0 : P.length) * P.uz;
      const ey = P.ay + (side === 0 ? 0 : P.length) * P.uy;
      for (let q = 0; q < n; q++) {
        const Q = plates[q]!;
        if (q === p || Math.abs(P.uz * Q.uz + P.uy * Q.uy) > 1e-9) continue;
        const s = (ez - Q.az) * Q.uz + (ey - Q.ay) * Q.uy;
        const d = -(ez - Q.az) * Q.uy + (ey - Q.ay) * Q.uz;
        const inward = out * (-P.uz * Q.uy + P.uy * Q.uz) * d < 0;
        if (Math.abs(Math.abs(d) - Q.t / 2) > tol || s < -tol || s > Q.length + tol || !inward) continue;
        grow[p]![side] = Math.abs(d);
        free[p]![side] = false;
        landed.push({ on: q, s, t: P.t });
        break;
      }
    }
  }
  // a free end flush with a junction half the landing plate's thickness away is an overhang: trim it
  for (const j of landed) {
    const Q = plates[j.on]!;
    if (free[j.on]![0] && Math.abs(j.s - j.t / 2) <= tol) grow[j.on]![0] = -j.s;
    if (free[j.on]![1] && Math.abs(Q.length - j.s - j.t / 2) <= tol) grow[j.on]![1] = -(Q.length - j.s);
  }
  const walls: WallPlate[] = plates.map((P, p) => {
    const g0 = grow[p]![0]!, g1 = grow[p]![1]!;
    return Object.freeze({
      start: Object.freeze({ y: P.ay - g0 * P.uy, z: P.az - g0 * P.uz }),
      end: Object.freeze({ y: P.ay + (P.length + g1) * P.uy, z: P.az + (P.length + g1) * P.uz }),
      thickness: P.t,
    });
  });
  // plates face to face: a link across the middle of the faces they share
  for (let p = 0; p < n; p++) {
    const P = plates[p]!;
    for (let q = p + 1; q < n; q++) {
      const Q = plates[q]!;
      const dot = P.uz * Q.uz + P.uy * Q.uy;
      if (Math.abs(Math.abs(dot) - 1) > 1e-9) continue;
      const d = -(Q.az - P.az) * P.uy + (Q.ay - P.ay) * P.uz;
      if (Math.abs(Math.abs(d) - (P.t + Q.t) / 2) > tol) continue;
      const q0 = (Q.az - P.az) * P.uz + (Q.ay - P.ay) * P.uy;
      const q1 = q0 + dot * Q.length;
      const lo = Math.max(0, Math.min(q0, q1));
      const hi = Math.min(P.length, Math.max(q0, q1));
      if (!(hi - lo > tol)) continue;
      const s = (lo + hi) / 2;
      const z = P.az + s * P.uz, y = P.ay + s * P.uy;
      walls.push(Object.freeze({ start: Object.freeze({ y, z }), end: Object.freeze({ y: y + d * P.uz, z: z - d * P.uy }), thickness: 0 }));
    }
  }
  return Object.freeze({ kind: "wall-model", plates: Object.freeze(walls) });
}

/**
 * The non-throwing form of {@link centreLineModel}.
 *
 * @example
 * ```ts
 * const r = tryCentreLineModel(circle({ diameter: 50 }));
 * if (!r.ok) console.log(r.error.code); // "centre-line-part-not-plate"
 * ```
 */
export function tryCentreLineModel(section: Section): Result<WallModel> {
  return attempt(() => centreLineModel(section));
}
