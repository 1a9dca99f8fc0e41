import type { Section, SectionPart } from "../section/index.js";
import type { FibrePoint } from "./types.js";

/** Unit vector at `angle` (radians from +z toward +y), as { y, z }. */
function direction(angle: number): FibrePoint {
  return { y: Math.sin(angle), z: Math.cos(angle) };
}

/** True when `angle` lies on the arc from `start` sweeping `sweep` counterclockwise. */
function onArc(angle: number, start: number, sweep: number): boolean {
  const turn = 2 * Math.PI;
  const rel = (((angle - start) % turn) + turn) % turn;
  return rel <= sweep + 1e-12;
}

/**
 * Points of a solid part where a linear stress field sigma = gy y + gz z can be extreme:
 * polygon corners; on a circle the two points along the gradient; on a sector its centre,
 * arc ends and the arc points along the gradient; on a fillet its corner and leg ends.
 * Absolute coordinates.
 */
export function candidatePoints(part: SectionPart, gy: number, gz: number): FibrePoint[] {
  const g = Math.hypot(gy, gz);
  const gradAngle = g > 0 ? Math.atan2(gy, gz) : 0;
  switch (part.kind) {
    case "polygon":
      return part.points.map((p) => ({ y: p.y, z: p.z }));
    case "circle": {
      const d = direction(gradAngle);
      const c = part.centre;
      return [
        { y: c.y + part.radius * d.y, z: c.z + part.radius * d.z },
        { y: c.y - part.radius * d.y, z: c.z - part.radius * d.z },
      ];
    }
    case "sector": {
      const c = part.centre;
      const out: FibrePoint[] = [{ y: c.y, z: c.z }];
      for (const a of [part.startAngle, part.startAngle + part.sweep, gradAngle, gradAngle + Math.PI]) {
        if (a === part.startAngle || a === part.startAngle + part.sweep || onArc(a, part.startAngle, part.sweep)) {
          const d = direction(a);
          out.push({ y: c.y + part.radius * d.y, z: c.z + part.radius * d.z });
        }
      }
      return out;
    }
    case "fillet": {
      const c = part.corner;
      const a = direction(part.orientation);
      const b = direction(part.orientation + Math.PI / 2);
      return [
        { y: c.y, z: c.z },
        { y: c.y + part.radius * a.y, z: c.z + part.radius * a.z },
        { y: c.y + part.radius * b.y, z: c.z + part.radius * b.z },
      ];
    }
    default: {
      const never: never = part;
      return never;
    }
  }
}

/** Heights (absolute) where a part's width may change abruptly or stop being smooth. */
export function partLevels(part: SectionPart): number[] {
  switch (part.kind) {
    case "polygon":
      return part.points.map((p) => p.y);
    case "circle":
      return [part.centre.y - part.radius, part.centre.y + part.radius];
    case "sector":
      return [
        part.centre.y,
        ...candidatePoints(part, 1, 0).map((p) => p.y),
        ...candidatePoints(part, -1, 0).map((p) => p.y),
      ];
    case "fillet":
      return candidatePoints(part, 0, 1).map((p) => p.y);
    default: {
      const never: never = part;
      return never;
    }
  }
}

/** Sorted, distinct heights of all parts, relative to `centroidY`. */
export function sectionLevels(section: Section, centroidY: number): number[] {
  const all = section.parts.flatMap((p) => partLevels(p)).map((y) => y - centroidY);
  all.sort((a, b) => a - b);
  return all.filter((v, i) => i === 0 || v - (all[i - 1] as number) > 1e-12 * (Math.abs(v) + 1));
}
