import { type IssueCollector, type IssuePath, requireFinite } from "../errors/index.js";

/** Records `second-moment-not-positive` unless `value` is a finite number above zero. */
export function checkSecondMoment(found: IssueCollector, value: unknown, path: IssuePath, what = "second moment of area"): boolean {
  if (!requireFinite(found, value, path, what)) return false;
  if (value > 0) return true;
  found.add(
    "second-moment-not-positive",
    path,
    `The ${what} must be above zero; got ${value}: check the section's dimensions.`,
    { value },
  );
  return false;
}

/** Records `fibre-outside-section` when `y` lies outside the extreme fibres (with a relative tolerance). */
export function checkFibreInside(found: IssueCollector, y: number, top: number, bottom: number, path: IssuePath): void {
  const slack = 1e-12 * Math.max(Math.abs(top), Math.abs(bottom), Number.MIN_VALUE);
  if (y > top + slack || y < bottom - slack) {
    found.add(
      "fibre-outside-section",
      path,
      `The fibre at y = ${y} lies outside the section (y from ${bottom} to ${top}, measured up from the centroid).`,
      { y, top, bottom },
    );
  }
}

/** Checks an extremes object: finite numbers with top >= 0 >= bottom. */
export function checkExtremes(found: IssueCollector, extremes: unknown, path: IssuePath): extremes is { top: number; bottom: number } {
  if (typeof extremes !== "object" || extremes === null) {
    found.add("extremes-missing", path, "Give the extreme fibres { top, bottom } about the centroid.");
    return false;
  }
  const e = extremes as Record<string, unknown>;
  const top = requireFinite(found, e["top"], [...path, "top"], "top fibre position");
  const bottom = requireFinite(found, e["bottom"], [...path, "bottom"], "bottom fibre position");
  if (!top || !bottom) return false;
  const t = e["top"] as number;
  const b = e["bottom"] as number;
  if (t < 0 || b > 0) {
    found.add(
      "extremes-not-about-centroid",
      path,
      `The extreme fibres must straddle the centroid (top >= 0 >= bottom); got top = ${t}, bottom = ${b}.`,
      { top: t, bottom: b },
    );
    return false;
  }
  return true;
}

/** Records `modular-ratio-not-positive` unless `value` is a finite number above zero. */
export function checkModularRatio(found: IssueCollector, value: unknown, path: IssuePath): boolean {
  if (!requireFinite(found, value, path, "modular ratio")) return false;
  if (value > 0) return true;
  found.add("modular-ratio-not-positive", path, `The modular ratio (E of the material / E of the reference) must be above zero; got ${value}.`, { value });
  return false;
}

/** Records `layer-upside-down` when a band's bottom lies above its top. */
export function checkOrder(found: IssueCollector, yBottom: number, yTop: number, path: IssuePath): void {
  if (yBottom > yTop) found.add("layer-upside-down", path, `The band's bottom (y = ${yBottom}) lies above its top (y = ${yTop}).`, { yBottom, yTop });
}
