// Checks one part's data: types, finite numbers, positive sizes, simple polygons.
import { describeValue, requireFinite, unknownKeyHint, type IssueCollector, type IssuePath } from "../errors/index.js";
import { normalisedPolygon, polygonArea } from "./edges.js";
import { LENGTH_LIMIT, isLength } from "./limits.js";
import { findSelfIntersection } from "./polygonCheck.js";

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Records `dimension-out-of-range` for a finite length beyond what the arithmetic carries; true when it is within. */
function checkLength(found: IssueCollector, value: number, path: IssuePath, what: string): boolean {
  if (Math.abs(value) <= LENGTH_LIMIT) return true;
  found.add(
    "dimension-out-of-range",
    path,
    `The ${what} is ${value}; section lengths must lie within ${LENGTH_LIMIT} in magnitude (second moments grow as a length to the fourth power): use a larger unit of length.`,
    { value, limit: LENGTH_LIMIT },
  );
  return false;
}

function isFiniteNumber(value: unknown): value is number {
  return typeof value === "number" && Number.isFinite(value);
}

// The checks take the parent path and the key, and build the field's path only for a report.
/** Records a problem with a point `{ y, z }` of finite numbers at `parent[key]`; true when it is fine. */
export function checkPoint(found: IssueCollector, value: unknown, parent: IssuePath, key: string | number, what: string): boolean {
  if (isObject(value) && isLength(value["y"]) && isLength(value["z"])) return true;
  const path = [...parent, key];
  if (!isObject(value)) {
    found.add("point-invalid", path, `The ${what} must be an object { y, z }; got ${describeValue(value)}.`);
    return false;
  }
  const okY = requireFinite(found, value["y"], [...path, "y"], `${what} y coordinate`) && checkLength(found, value["y"], [...path, "y"], `${what} y coordinate`);
  const okZ = requireFinite(found, value["z"], [...path, "z"], `${what} z coordinate`) && checkLength(found, value["z"], [...path, "z"], `${what} z coordinate`);
  return okY && okZ;
}

function checkPositive(found: IssueCollector, value: unknown, parent: IssuePath, key: string, what: string, code = "dimension-not-positive", length = true): boolean {
  if (isFiniteNumber(value) && value > 0 && (!length || value <= LENGTH_LIMIT)) return true;
  const path = [...parent, key];
  if (!requireFinite(found, value, path, what)) return false;
  if (value > 0) return checkLength(found, value, path, what);
  found.add(code, path, `The ${what} must be greater than zero; got ${value}.`, { value });
  return false;
}

function checkMaterial(found: IssueCollector, value: unknown, parent: IssuePath): void {
  if (value === undefined) return;
  const path = [...parent, "material"];
  if (!isObject(value)) {
    found.add("material-invalid", path, `The material must be an object { elasticModulus, yieldStrength?, name? }; got ${describeValue(value)}.`);
    return;
  }
  checkFields(found, value, MATERIAL_FIELDS, path, "material");
  checkPositive(found, value["elasticModulus"], path, "elasticModulus", "elastic modulus", "elastic-modulus-not-positive", false);
  if (value["yieldStrength"] !== undefined) {
    checkPositive(found, value["yieldStrength"], path, "yieldStrength", "yield strength", "yield-strength-not-positive", false);
  }
  if (value["name"] !== undefined && typeof value["name"] !== "string") {
    found.add("material-invalid", [...path, "name"], `The material name must be a string; got ${describeValue(value["name"])}.`);
  }
}

function allCollinear(zs: readonly number[], ys: readonly number[], size: number): boolean {
  const z0 = zs[0] ?? 0;
  const y0 = ys[0] ?? 0;
  let far = 0;
  let best = -1;
  for (let i = 1; i < zs.length; i++) {
    const d = Math.hypot((zs[i] ?? 0) - z0, (ys[i] ?? 0) - y0);
    if (d > best) {
      best = d;
      far = i;
    }
  }
  const dz = (zs[far] ?? 0) - z0;
  const dy = (ys[far] ?? 0) - y0;
  for (let i = 1; i < zs.length; i++) {
    const cross = dz * ((ys[i] ?? 0) - y0) - dy * ((zs[i] ?? 0) - z0);
    if (Math.abs(cross) > 1e-12 * size * size) return false;
  }
  return true;
}

function checkPolygon(found: IssueCollector, part: Record<string, unknown>, path: IssuePath): void {
  const points = part["points"];
  if (!Array.isArray(points)) {
    found.add("polygon-degenerate", [...path, "points"], `A polygon needs a list of at least three points { y, z }; got ${describeValue(points)}.`);
    return;
  }
  let ok = true;
  for (let i = 0; i < points.length; i++) {
    const p: unknown = points[i];
    // fast path for a well-formed point; the full check (with its path) only when one is not
    if (isObject(p) && isLength(p["y"]) && isLength(p["z"])) continue;
    if (!checkPoint(found, p, [...path, "points"], i, `point ${i}`)) ok = false;
  }
  if (!ok) return;
  const { zs, ys } = normalisedPolygon(points as { y: number; z: number }[]);
  if (zs.length < 3) {
    found.add("polygon-degenerate", [...path, "points"], `A polygon needs at least three distinct points; got ${zs.length}.`, { distinctPoints: zs.length });
    return;
  }
  let zMin = Infinity, zMax = -Infinity, yMin = Infinity, yMax = -Infinity;
  for (let i = 0; i < zs.length; i++) {
    const z = zs[i] ?? 0;
    const y = ys[i] ?? 0;
    zMin = Math.min(zMin, z);
    zMax = Math.max(zMax, z);
    yMin = Math.min(yMin, y);
    yMax = Math.max(yMax, y);
  }
  const size = Math.max(zMax - zMin, yMax - yMin);
  const pair = findSelfIntersection(zs, ys);
  const area = polygonArea(zs, ys);
  if (!(area > 1e-12 * size * size) && (!pair || allCollinear(zs, ys, size))) {
    found.add("polygon-degenerate", [...path, "points"], "The polygon encloses no area (its points are collinear or coincide); give corner points that enclose the part.", { area });
    return;
  }
  if (pair) {
    found.add(
      "polygon-self-intersecting",
      [...path, "points"],
      `The polygon's boundary crosses or touches itself (edges starting at points ${pair[0]} and ${pair[1]} of the cleaned list); give the points in order around a simple outline.`,
      { edges: pair },
    );
  }
}

/** The fields each kind of part has (a misspelt field would otherwise be ignored). */
const FIELDS: Readonly<Record<string, readonly string[]>> = {
  polygon: ["kind", "points", "hole", "material"],
  circle: ["kind", "centre", "radius", "hole", "material"],
  sector: ["kind", "centre", "radius", "startAngle", "sweep", "hole", "material"],
  fillet: ["kind", "corner", "radius", "orientation", "hole", "material"],
};
const MATERIAL_FIELDS = ["name", "elasticModulus", "yieldStrength"];

function checkFields(found: IssueCollector, value: Record<string, unknown>, known: readonly string[], path: IssuePath, what: string): void {
  for (const key of Object.keys(value)) {
    if (!known.includes(key)) found.add("unknown-field", [...path, key], `Unknown ${what} field "${key}".${unknownKeyHint(key, known)}`, { field: key });
  }
}

/** Records every problem with one part's data; true when the part is usable. */
export function validatePart(found: IssueCollector, part: unknown, path: IssuePath): boolean {
  const before = found.issues.length;
  if (!isObject(part)) {
    found.add("part-invalid", path, `A part must be an object with a kind ("polygon", "circle", "sector" or "fillet"); got ${describeValue(part)}.`);
    return false;
  }
  const hole = part["hole"];
  if (hole !== undefined && typeof hole !== "boolean") {
    found.add("part-invalid", [...path, "hole"], `"hole" must be true or false; got ${describeValue(hole)}.`);
  }
  checkMaterial(found, part["material"], path);
  const kind = part["kind"];
  if (typeof kind === "string" && Object.hasOwn(FIELDS, kind)) checkFields(found, part, FIELDS[kind]!, path, `${kind} part`);
  switch (kind) {
    case "polygon":
      checkPolygon(found, part, path);
      break;
    case "circle":
      checkPoint(found, part["centre"], path, "centre", "centre");
      checkPositive(found, part["radius"], path, "radius", "radius");
      break;
    case "sector": {
      checkPoint(found, part["centre"], path, "centre", "centre");
      checkPositive(found, part["radius"], path, "radius", "radius");
      requireFinite(found, part["startAngle"], [...path, "startAngle"], "start angle");
      const sweep = part["sweep"];
      if (requireFinite(found, sweep, [...path, "sweep"], "sweep") && !(sweep > 0 && sweep <= 2 * Math.PI)) {
        found.add("sector-sweep-out-of-range", [...path, "sweep"], `A sector's sweep must be greater than 0 and at most 2 pi radians; got ${sweep}.`, { sweep });
      }
      break;
    }
    case "fillet":
      checkPoint(found, part["corner"], path, "corner", "corner");
      checkPositive(found, part["radius"], path, "radius", "radius");
      requireFinite(found, part["orientation"], [...path, "orientation"], "orientation");
      break;
    default:
      found.add("part-kind-unknown", [...path, "kind"], `Unknown part kind ${describeValue(kind)}; use "polygon", "circle", "sector" or "fillet".`, { kind: describeValue(kind) });
  }
  return found.issues.length === before;
}
