import { IssueCollector, describeValue, requireFinite, type IssuePath } from "../errors/index.js";
import { cosExact, sinExact } from "./angles.js";
import { section } from "./construct.js";
import { prepareSection } from "./prepare.js";
import type { Section, SectionPart, SectionPoint } from "./types.js";
import { checkPoint, validatePart } from "./validatePart.js";

/** Which axis to mirror across: "y" (the vertical axis z = 0: left and right swap) or "z" (the horizontal axis y = 0: top and bottom swap). */
export type MirrorAxis = "y" | "z";

function mapPart(part: SectionPart, point: (p: SectionPoint) => SectionPoint, angle: (a: number) => number, fillet: (o: number) => number, sweepStart: (start: number, sweep: number) => number): SectionPart {
  switch (part.kind) {
    case "polygon":
      return { ...part, points: part.points.map(point) };
    case "circle":
      return { ...part, centre: point(part.centre) };
    case "sector":
      return { ...part, centre: point(part.centre), startAngle: sweepStart(angle(part.startAngle), part.sweep) };
    case "fillet":
      return { ...part, corner: point(part.corner), orientation: fillet(part.orientation) };
    default: {
      const never: never = part;
      return never;
    }
  }
}

/** Records a problem with the mirror axis: only the section plane's own axes, "y" and "z". */
function checkAxis(found: IssueCollector, axis: unknown): void {
  if (axis === "y" || axis === "z") return;
  const x = axis === "x" || axis === "X" ? " (x is the member's axis, not an axis of the section plane)" : "";
  found.add(
    "mirror-axis-invalid",
    ["axis"],
    `Mirror across "y" (the vertical axis: z becomes -z, left and right swap) or "z" (the horizontal axis: y becomes -y, upside down); got ${describeValue(axis)}${x}.`,
    { axis: describeValue(axis) },
  );
}

/** The arguments of a part transform, checked: the part, then the named points and numbers. */
function checkArguments(part: unknown, check: (found: IssueCollector) => void, path: IssuePath = ["part"]): void {
  const found = new IssueCollector();
  validatePart(found, part, path);
  check(found);
  found.throwIfAny();
}

/** The section's parts, checked (a section made by flexura is checked once, when made). */
function partsOf(s: Section, check: (found: IssueCollector) => void): readonly SectionPart[] {
  const found = new IssueCollector();
  check(found);
  found.throwIfAny();
  return prepareSection(s).section.parts;
}

/**
 * The part moved by `by` (length): every point gains `by.y` and `by.z`.
 *
 * @throws FlexuraError any part code of `section()`; `point-invalid`, `not-a-number`, `not-finite` for `by`.
 * @example
 * ```ts
 * const moved = translatePart({ kind: "circle", centre: { y: 0, z: 0 }, radius: 5 }, { y: 100, z: 0 });
 * ```
 */
export function translatePart(part: SectionPart, by: SectionPoint): SectionPart {
  checkArguments(part, (found) => checkPoint(found, by, [], "by", "offset"));
  return translated(part, by);
}

function translated(part: SectionPart, by: SectionPoint): SectionPart {
  const point = (p: SectionPoint): SectionPoint => ({ y: p.y + by.y, z: p.z + by.z });
  const same = (a: number): number => a;
  return mapPart(part, point, same, same, same);
}

/**
 * The part rotated by `angle` radians counterclockwise (from +z towards +y) about `about`
 * (default the origin). Quarter turns are exact.
 *
 * @throws FlexuraError any part code of `section()`; `point-invalid`, `not-a-number`, `not-finite` for `angle` or `about`.
 * @example
 * ```ts
 * const plate: SectionPart = { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 100 }, { y: 10, z: 100 }, { y: 10, z: 0 }] };
 * const upright = rotatePart(plate, Math.PI / 2);
 * ```
 */
export function rotatePart(part: SectionPart, angle: number, about: SectionPoint = { y: 0, z: 0 }): SectionPart {
  checkArguments(part, (found) => {
    requireFinite(found, angle, ["angle"], "angle of rotation");
    checkPoint(found, about, [], "about", "centre of rotation");
  });
  return rotated(part, angle, about);
}

function rotated(part: SectionPart, angle: number, about: SectionPoint = { y: 0, z: 0 }): SectionPart {
  const c = cosExact(angle);
  const s = sinExact(angle);
  const point = (p: SectionPoint): SectionPoint => {
    const dz = p.z - about.z;
    const dy = p.y - about.y;
    return { y: about.y + dz * s + dy * c, z: about.z + dz * c - dy * s };
  };
  const turn = (a: number): number => a + angle;
  return mapPart(part, point, turn, turn, (start) => start);
}

/**
 * The part mirrored across an axis through the origin: `"y"` maps z to -z (left and right
 * swap), `"z"` maps y to -y (turns it upside down). Combine with {@link translatePart} to
 * mirror across another line.
 *
 * @throws FlexuraError any part code of `section()`; `mirror-axis-invalid` for an axis other than "y" or "z".
 * @example
 * ```ts
 * const otherSide = mirrorPart({ kind: "fillet", corner: { y: 90, z: 5 }, radius: 12, orientation: -Math.PI / 2 }, "y");
 * ```
 */
export function mirrorPart(part: SectionPart, axis: MirrorAxis): SectionPart {
  checkArguments(part, (found) => checkAxis(found, axis));
  return mirrored(part, axis);
}

function mirrored(part: SectionPart, axis: MirrorAxis): SectionPart {
  if (axis === "y") {
    // z -> -z: an angle t becomes pi - t; a sector's sweep runs the other way
    return mapPart(part, (p) => ({ y: p.y, z: -p.z }), (a) => Math.PI - a, (o) => Math.PI / 2 - o, (start, sweep) => start - sweep);
  }
  return mapPart(part, (p) => ({ y: -p.y, z: p.z }), (a) => -a, (o) => -o - Math.PI / 2, (start, sweep) => start - sweep);
}

/**
 * The section moved by `by` (length).
 *
 * @throws FlexuraError any code of `section()` when the input is not a valid section; `point-invalid`,
 *   `not-a-number`, `not-finite` for a bad offset, angle or centre; `mirror-axis-invalid` for an axis other than "y" or "z".
 * @example
 * ```ts
 * const raised = translateSection(rectangle({ width: 100, depth: 20 }), { y: 160, z: 0 });
 * ```
 */
export function translateSection(s: Section, by: SectionPoint): Section {
  return section(partsOf(s, (found) => checkPoint(found, by, [], "by", "offset")).map((p) => translated(p, by)));
}

/**
 * The section rotated by `angle` radians counterclockwise about `about` (default the origin).
 *
 * @throws FlexuraError any code of `section()` when the input is not a valid section; `point-invalid`,
 *   `not-a-number`, `not-finite` for a bad offset, angle or centre; `mirror-axis-invalid` for an axis other than "y" or "z".
 * @example
 * ```ts
 * const onItsSide = rotateSection(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 }), Math.PI / 2);
 * ```
 */
export function rotateSection(s: Section, angle: number, about?: SectionPoint): Section {
  const parts = partsOf(s, (found) => {
    requireFinite(found, angle, ["angle"], "angle of rotation");
    if (about !== undefined) checkPoint(found, about, [], "about", "centre of rotation");
  });
  return section(parts.map((p) => rotated(p, angle, about)));
}

/**
 * The section mirrored across the y axis (`"y"`, left-right) or the z axis (`"z"`, upside down).
 *
 * @throws FlexuraError any code of `section()` when the input is not a valid section; `point-invalid`,
 *   `not-a-number`, `not-finite` for a bad offset, angle or centre; `mirror-axis-invalid` for an axis other than "y" or "z".
 * @example
 * ```ts
 * const stemUp = mirrorSection(tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 }), "z");
 * ```
 */
export function mirrorSection(s: Section, axis: MirrorAxis): Section {
  return section(partsOf(s, (found) => checkAxis(found, axis)).map((p) => mirrored(p, axis)));
}
