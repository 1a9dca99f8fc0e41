// Which candidate points of a section lie on the boundary of its material: a point where parts
// meet inside the section (a web's corner under a flange covered by a root fillet) has material
// all round it, and no extreme of a linear stress field can lie there.
import { containsPoint } from "../section/contain.js";
import { prepareSection } from "../section/prepare.js";
import type { Section } from "../section/index.js";
import type { FibrePoint } from "./types.js";

const DIRECTIONS = 16;

/**
 * Keeps the points (absolute) that lie on the boundary of the section's material: those with
 * some point of no material within 1e-7 of the section's size of them (probed in sixteen
 * directions; any boundary corner has an opening of more than a sixteenth of a turn unless it is
 * a knife edge, which the probes at the size's 1e-7 then see as interior).
 */
export function onBoundary(section: Section, points: readonly FibrePoint[]): FibrePoint[] {
  const p = prepareSection(section);
  const size = Math.max(p.box[1]! - p.box[0]!, p.box[3]! - p.box[2]!);
  const step = 1e-7 * size;
  const material = (z: number, y: number): boolean => {
    let n = 0;
    for (let i = 0; i < p.count; i++) {
      const b = p.partBox;
      if (z < b[i * 4]! || z > b[i * 4 + 1]! || y < b[i * 4 + 2]! || y > b[i * 4 + 3]!) continue;
      if (containsPoint(p.edges, p.edgeStart[i]!, p.edgeStart[i + 1]!, z, y, 0)) n += p.sign[i]!;
    }
    return n > 0;
  };
  return points.filter((q) => {
    const z = q.z - p.refZ;
    const y = q.y - p.refY;
    for (let k = 0; k < DIRECTIONS; k++) {
      const t = (2 * Math.PI * (k + 0.5)) / DIRECTIONS;
      if (!material(z + step * Math.cos(t), y + step * Math.sin(t))) return true;
    }
    return false;
  });
}
