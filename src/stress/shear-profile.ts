import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { bandLevels, checkBands, firstMomentAbove, widthAt, type DepthBand } from "./bands.js";
import type { ShearProperties } from "./shear.js";
import { checkPointsPerBand, findPeak, pointAt, profilePoints, type CutSource } from "./shear-peak.js";
import { checkFibreInside, checkSecondMoment } from "./validate.js";
import { depthBandTerms } from "./width-terms.js";

/**
 * The shear stress in one material at a cut of a multi-material section, by the transformed
 * section: tau_i = n_i V Q* / (I* b*), with Q* and I* transformed and b* = sum of n_j b_j the
 * transformed width of the cut.
 */
export interface MaterialShearStress {
  /** The material's modular ratio n = E / E_ref (parts of equal modulus count as one material). */
  readonly modularRatio: number;
  /** Indices of the solid parts of this material in `section.parts`. */
  readonly parts: readonly number[];
  /** Height of the cut, up from the transformed centroid (length). */
  readonly y: number;
  /** The material's own (actual) width on the cut (length). */
  readonly width: number;
  /** tau_i = n_i V Q* / (I* b*) (force / length^2), with the sign of V. */
  readonly stress: number;
  /**
   * At the peak only: each solid part's own peak, n_i V Q* / (I* b*) of largest magnitude over
   * the heights from the part's bottom to its top, so that each part can be checked against its
   * own allowable; the material's `stress` is the largest of them.
   */
  readonly byPart?: readonly PartShearStress[];
}

/** The peak shear stress in one solid part of a multi-material section (over its own heights). */
export interface PartShearStress {
  /** The part's index in `section.parts`. */
  readonly part: number;
  /** Height of the cut, up from the transformed centroid (length). */
  readonly y: number;
  /** tau_i = n_i V Q* / (I* b*) there (force / length^2), with the sign of V. */
  readonly stress: number;
}

/** The shear stress at one height of a section. */
export interface ShearStressPoint {
  /** Height of the cut, up from the centroid (length). */
  readonly y: number;
  /** Shear stress tau = V Q / (I b) (force / length^2), with the sign of V. */
  readonly stress: number;
  /** First moment of the (transformed) area above the cut (length^3). */
  readonly firstMoment: number;
  /** Width of material at the cut (length). */
  readonly width: number;
  /**
   * Sections from the section module only: the transformed width b* = sum of n_i b_i of the cut
   * (length), which `stress` uses (equal to `width` for one material).
   */
  readonly transformedWidth?: number;
  /**
   * Multi-material sections from the section module only: the stress in each material at this
   * cut (at the peak: each material's own peak over its parts' heights), which `stress`, the
   * stress on the transformed section (in the reference material), is not.
   */
  readonly materials?: readonly MaterialShearStress[];
}

/** The shear stress over the depth of a section, for plotting. */
export interface ShearStressProfile {
  /** Tag. */
  readonly kind: "shear-stress-profile";
  /**
   * Points from the bottom to the top, including every height where the width changes; where
   * the width steps (a flange meeting a web) the same y appears twice, below then above the step.
   */
  readonly points: readonly ShearStressPoint[];
  /** The point of largest magnitude: see {@link peakShearStress}. */
  readonly peak: ShearStressPoint;
}

/** Options of {@link shearStressProfile}. */
export interface ShearStressProfileOptions {
  /** Points per band between consecutive width-change heights (>= 1), for plotting (the peak does not depend on them); 16 when omitted. */
  readonly pointsPerBand?: number;
}

function area(band: DepthBand): number {
  const n = (band.modularRatio ?? 1) * (band.hole === true ? -1 : 1);
  return band.kind === "trapezoid" ? (n * (band.widthBottom + band.widthTop) * (band.yTop - band.yBottom)) / 2 : n * Math.PI * band.radius * band.radius;
}

/** The bands seen as a {@link CutSource}. */
function bandSource(bands: readonly DepthBand[]): CutSource {
  return {
    levels: bandLevels(bands),
    firstMoment: (y) => firstMomentAbove(bands, y),
    width: (y, side) => widthAt(bands, y, side),
    terms: () => depthBandTerms(bands),
  };
}

function validate(shear: number, bands: readonly DepthBand[], section: ShearProperties, found: IssueCollector): void {
  requireFinite(found, shear, ["shear"], "shear force");
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  if (!checkBands(found, bands, ["bands"])) return;
  const levels = bandLevels(bands);
  const depth = (levels[levels.length - 1] ?? 0) - (levels[0] ?? 0);
  const total = bands.reduce((s, b) => s + area(b), 0);
  const moment = firstMomentAbove(bands, -Infinity);
  if (!(total > 0)) {
    found.add("bands-no-area", ["bands"], `The bands enclose no area (net ${total}): holes must lie inside solid parts.`, { area: total });
  } else if (Math.abs(moment) > 1e-9 * total * depth) {
    found.add(
      "bands-not-about-centroid",
      ["bands"],
      `The bands' centroid lies at y = ${moment / total}, not 0: measure y from the centroid.`,
      { centroidY: moment / total },
    );
  }
}

/**
 * Shear stress tau = V Q / (I b) at a horizontal cut of a section described by bands (see
 * {@link DepthBand}); at a step in width it uses the narrower side (the larger stress).
 * Source: Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
 *
 * @param shear - Shear force V (force).
 * @param y - Height of the cut, up from the centroid (length), within the section.
 * @param bands - The section, y measured from its (transformed) centroid.
 * @param section - `secondMomentZ` (length^4, > 0), transformed for several materials.
 * @returns The stress with Q and b at the cut.
 * @throws FlexuraError `second-moment-not-positive`, `fibre-outside-section`, `width-not-positive` (a gap),
 *   `bands-not-about-centroid`, `bands-no-area`, and the band codes of {@link cutAt}.
 * @example
 * ```ts
 * const rect = [{ kind: "trapezoid", yBottom: -100, yTop: 100, widthBottom: 100, widthTop: 100 }] as const;
 * shearStressAt(30e3, 0, rect, { secondMomentZ: 100 * 200 ** 3 / 12 }).stress; // 2.25
 * ```
 */
export function shearStressAt(shear: number, y: number, bands: readonly DepthBand[], section: ShearProperties): ShearStressPoint {
  const found = new IssueCollector();
  validate(shear, bands, section, found);
  requireFinite(found, y, ["y"], "cut height y");
  found.throwIfAny();
  const levels = bandLevels(bands);
  const bottom = levels[0] ?? 0;
  const top = levels[levels.length - 1] ?? 0;
  checkFibreInside(found, y, top, bottom, ["y"]);
  const width = Math.min(widthAt(bands, y, "above"), widthAt(bands, y, "below"));
  if (y > bottom && y < top && !(width > 0)) {
    found.add("width-not-positive", ["y"], `There is no material at y = ${y} (a gap between parts): cut through the section.`, { y });
  }
  found.throwIfAny();
  return pointAt(shear, bandSource(bands), section.secondMomentZ, y, width);
}

/**
 * Non-throwing form of {@link shearStressAt}.
 *
 * @example
 * ```ts
 * tryShearStressAt(1, 500, [{ kind: "circle", centreY: 0, radius: 10 }], { secondMomentZ: 7854 }).ok; // false
 * ```
 */
export function tryShearStressAt(shear: number, y: number, bands: readonly DepthBand[], section: ShearProperties): Result<ShearStressPoint> {
  return attempt(() => shearStressAt(shear, y, bands, section));
}

/**
 * The largest shear stress over the depth of a section, tau = V Q / (I b), and where it acts.
 * For a rectangle it is 1.5 V / A at the neutral axis, for a solid circle 4 V / (3 A) there,
 * but for shapes that narrow toward the centroid (a diamond, say) it lies elsewhere; for an I
 * section it is in the web at the neutral axis. The peak comes from roots, not a search: with
 * y from the centroid dQ/dy = -b_t y, so d(Q/b)/dy = N / b^2 with N = -b_t b y - Q b'; between
 * the heights where the width changes form the peak is at a band end or at a root of N, a cubic
 * on trapezoid bands (polynomial root finder) and, on circle bands, isolated by interval bounds
 * and refined by bisection to machine precision (see docs/stress-and-checks.md).
 * Source: Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
 *
 * @param shear - Shear force V (force).
 * @param bands - The section, y up from its (transformed) centroid.
 * @param section - `secondMomentZ` (length^4, > 0).
 * @returns The peak point (stress with the sign of V).
 * @throws FlexuraError `second-moment-not-positive`, `bands-not-about-centroid`, `bands-no-area`, and the band codes of {@link cutAt}.
 * @example
 * ```ts
 * peakShearStress(30e3, [{ kind: "trapezoid", yBottom: -100, yTop: 100, widthBottom: 100, widthTop: 100 }],
 *   { secondMomentZ: 100 * 200 ** 3 / 12 }); // { y: 0, stress: 2.25, ... }
 * ```
 */
export function peakShearStress(shear: number, bands: readonly DepthBand[], section: ShearProperties): ShearStressPoint {
  const found = new IssueCollector();
  validate(shear, bands, section, found);
  found.throwIfAny();
  return findPeak(shear, bandSource(bands), section.secondMomentZ);
}

/**
 * Non-throwing form of {@link peakShearStress}.
 *
 * @example
 * ```ts
 * tryPeakShearStress(1, [], { secondMomentZ: 1 }).ok; // false
 * ```
 */
export function tryPeakShearStress(shear: number, bands: readonly DepthBand[], section: ShearProperties): Result<ShearStressPoint> {
  return attempt(() => peakShearStress(shear, bands, section));
}

/**
 * The shear stress over the depth of a section, for plotting, with its peak
 * (see {@link peakShearStress}).
 *
 * @param shear - Shear force V (force).
 * @param bands - The section, y up from its (transformed) centroid.
 * @param section - `secondMomentZ` (length^4, > 0).
 * @param options - Point density; see {@link ShearStressProfileOptions}.
 * @returns Points bottom to top and the peak.
 * @throws FlexuraError as {@link peakShearStress}, and `points-per-band-invalid`.
 * @example
 * ```ts
 * shearStressProfile(1, [{ kind: "circle", centreY: 0, radius: 1 }], { secondMomentZ: Math.PI / 4 }).peak.stress; // 4 / (3 pi)
 * ```
 */
export function shearStressProfile(
  shear: number,
  bands: readonly DepthBand[],
  section: ShearProperties,
  options?: ShearStressProfileOptions,
): ShearStressProfile {
  const found = new IssueCollector();
  validate(shear, bands, section, found);
  const perBand = checkPointsPerBand(found, options?.pointsPerBand);
  found.throwIfAny();
  const source = bandSource(bands);
  const points = profilePoints(shear, source, section.secondMomentZ, perBand);
  return { kind: "shear-stress-profile", points, peak: findPeak(shear, source, section.secondMomentZ) };
}

/**
 * Non-throwing form of {@link shearStressProfile}.
 *
 * @example
 * ```ts
 * tryShearStressProfile(1, [], { secondMomentZ: 1 }).ok; // false
 * ```
 */
export function tryShearStressProfile(
  shear: number,
  bands: readonly DepthBand[],
  section: ShearProperties,
  options?: ShearStressProfileOptions,
): Result<ShearStressProfile> {
  return attempt(() => shearStressProfile(shear, bands, section, options));
}
