/**
 * A linear map from a data interval to a drawing interval, as a plain function.
 *
 * @example
 * ```ts
 * const x = linearScale([0, 6], [40, 640]);
 * x(3); // 340
 * ```
 */
export type LinearScale = (value: number) => number;

/**
 * Builds a linear map taking `domain[0]` to `range[0]` and `domain[1]` to `range[1]`. An empty
 * domain (both ends equal) maps everything to the middle of the range.
 *
 * @param domain - Data values at the two ends, in data units.
 * @param range - Drawing coordinates at the two ends, in SVG user units.
 * @example
 * ```ts
 * linearScale([0, 10], [100, 0])(2.5); // 75 (y grows downward in SVG)
 * ```
 */
export function linearScale(domain: readonly [number, number], range: readonly [number, number]): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0;
  if (span === 0 || !Number.isFinite(span)) return () => (r0 + r1) / 2;
  const k = (r1 - r0) / span;
  return (value) => r0 + (value - d0) * k;
}

/**
 * Round tick values covering `[min, max]`: steps of 1, 2 or 5 times a power of ten, about
 * `count` of them (common practice for chart axes). Returns `[min]` for an empty interval.
 *
 * @param min - Low end of the data, any unit.
 * @param max - High end of the data, same unit.
 * @param count - Roughly how many ticks are wanted; default 5.
 * @example
 * ```ts
 * niceTicks(0, 9); // [0, 2, 4, 6, 8]
 * ```
 */
export function niceTicks(min: number, max: number, count = 5): readonly number[] {
  if (!(max > min) || !Number.isFinite(max - min)) return [min];
  const raw = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / power;
  const tolerance = 1e-9; // so that 2.0000000000000004 counts as 2
  const step = (fraction <= 1 + tolerance ? 1 : fraction <= 2 + tolerance ? 2 : fraction <= 5 + tolerance ? 5 : 10) * power;
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const ticks: number[] = [];
  for (let i = first; i <= last; i++) ticks.push(cleanZero(Number((i * step).toPrecision(12))));
  // A coarse step can miss a short interval altogether: then its low end is the one tick.
  return ticks.length > 0 ? ticks : [min];
}

/**
 * Widens `[min, max]` so that it includes zero and is never empty: the interval a diagram of a
 * quantity along a member uses, so that its baseline (zero) is always in view.
 *
 * @example
 * ```ts
 * valueExtent([-3, 12]); // [-3, 12]
 * valueExtent([0, 0]);   // [-1, 1]
 * ```
 */
export function valueExtent(values: readonly number[]): readonly [number, number] {
  let lo = 0;
  let hi = 0;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (hi === lo) return [lo - 1, hi + 1];
  return [lo, hi];
}

function cleanZero(value: number): number {
  return value === 0 ? 0 : value;
}
