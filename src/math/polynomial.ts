// Polynomials stored as coefficient runs inside a Float64Array: c[off + k] multiplies t^k.

/** Horner's rule on `c[off..off+degree]` at `t`, unchecked (for flexura's kernels; the checked form is in polynomial-api.ts). */
export function evaluatePolynomial(coefficients: ArrayLike<number>, offset: number, degree: number, t: number): number {
  let v = coefficients[offset + degree] as number;
  for (let k = degree - 1; k >= 0; k--) v = v * t + (coefficients[offset + k] as number);
  return v;
}

/** Scratch storage, one run per recursion level: derivative coefficients, interval ends, roots found. */
const MAX_DEGREE = 8;
/** Coefficients rescaled by a power of two when they are too large for the arithmetic. */
const rescaled = new Float64Array(MAX_DEGREE + 1);
/** Bound on |coefficient| and on sum |c_k| m^k under which values, derivatives and their products stay finite. */
const SAFE_SIZE = 2 ** 1000;
let overflowed = false;

/**
 * True when root finding since the last call met values beyond what a double can hold (its
 * answer may then miss roots); clears the flag.
 */
export function takeRootOverflow(): boolean {
  const o = overflowed;
  overflowed = false;
  return o;
}
const RUN = MAX_DEGREE + 2;
const derivativeScratch = new Float64Array((MAX_DEGREE + 1) * (MAX_DEGREE + 1));
const rootScratch = new Float64Array((MAX_DEGREE + 2) * RUN);
/**
 * Roots written by {@link rootsToScratch}: the roots of the last call sit at indices
 * `0 .. count - 1` (read them before the next call). Deeper levels use the later runs.
 */
export const scratchRoots = new Float64Array((MAX_DEGREE + 2) * RUN);

/** The roots in `[lo, hi]`, appended to `out`, unchecked (the checked form is in polynomial-api.ts). */
export function polynomialRootsIn(coefficients: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number, out: number[]): number {
  const count = rootsToScratch(coefficients, offset, degree, lo, hi);
  const start = out.length;
  for (let i = 0; i < count; i++) {
    const x = scratchRoots[i] as number;
    // a root equal to the last one already in `out` is not repeated
    if (i === 0 && out.length > 0 && out[out.length - 1] === x) continue;
    out.push(x);
  }
  return out.length - start;
}

/**
 * As {@link polynomialRootsIn}, without allocating: writes the roots to
 * `scratchRoots[0 .. count - 1]` and returns `count`. For flexura's own kernels.
 */
export function rootsToScratch(coefficients: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number): number {
  let d = degree;
  while (d > 0 && coefficients[offset + d] === 0) d--;
  if (d === 0) return 0;
  // Roots do not change when the polynomial is scaled: coefficients too large for the arithmetic
  // (values, derivatives, a discriminant) are scaled by a power of two, which is exact.
  const m = Math.max(Math.abs(lo), Math.abs(hi));
  let size = 0;
  let big = 0;
  let p = 1;
  for (let k = 0; k <= d; k++) {
    const a = Math.abs(coefficients[offset + k] as number);
    size += a * p;
    p *= m;
    if (a > big) big = a;
  }
  if (size <= SAFE_SIZE && big <= SAFE_SIZE) return rootsRecursive(coefficients, offset, d, lo, hi, 0);
  let scale = big > SAFE_SIZE ? 2 ** -Math.ceil(Math.log2(big)) : 1;
  size = 0;
  p = 1;
  for (let k = 0; k <= d; k++) {
    size += Math.abs(coefficients[offset + k] as number) * scale * p;
    p *= m;
  }
  if (!(size < Infinity)) {
    overflowed = true;
    return 0;
  }
  if (size > SAFE_SIZE) scale *= 2 ** -(Math.ceil(Math.log2(size)) - 990);
  for (let k = 0; k <= d; k++) rescaled[k] = (coefficients[offset + k] as number) * scale;
  return rootsRecursive(rescaled, 0, d, lo, hi, 0);
}

/** Appends root `r` (clamped into [lo, hi] when within slack) to the run at `base` holding `n` roots; returns the new count. */
function pushRoot(base: number, n: number, r: number, lo: number, hi: number): number {
  const slack = 1e-12 * (Math.abs(hi - lo) + Math.abs(lo) + Math.abs(hi));
  if (!(r >= lo - slack && r <= hi + slack)) return n;
  const x = r < lo ? lo : r > hi ? hi : r;
  if (n > 0 && x === scratchRoots[base + n - 1]) return n;
  scratchRoots[base + n] = x;
  return n + 1;
}

/** Roots of c[off..off+d] in [lo, hi] into the scratch run of `level`; returns their number. */
function rootsRecursive(c: ArrayLike<number>, off: number, d: number, lo: number, hi: number, level: number): number {
  while (d > 0 && c[off + d] === 0) d--;
  if (d === 0) return 0;
  const base = level * RUN;
  if (d === 1) return pushRoot(base, 0, -(c[off] as number) / (c[off + 1] as number), lo, hi);
  if (d === 2) return quadraticRoots(c[off] as number, c[off + 1] as number, c[off + 2] as number, lo, hi, base);
  // Derivative into scratch, then its roots (recursively, one level down) into scratch.
  const dOff = level * (MAX_DEGREE + 1);
  for (let k = 1; k <= d; k++) derivativeScratch[dOff + k - 1] = k * (c[off + k] as number);
  const critical = rootsRecursive(derivativeScratch, dOff, d - 1, lo, hi, level + 1);
  const critBase = base + RUN;
  let n = 0;
  rootScratch[base + n++] = lo;
  for (let i = 0; i < critical; i++) {
    const r = scratchRoots[critBase + i] as number;
    if (r > lo && r < hi) rootScratch[base + n++] = r;
  }
  rootScratch[base + n++] = hi;
  // Scale of the polynomial on the interval, for "touching zero" decisions.
  let scale = 0;
  const m = Math.max(Math.abs(lo), Math.abs(hi));
  let p = 1;
  for (let k = 0; k <= d; k++) {
    scale += Math.abs(c[off + k] as number) * p;
    p *= m;
  }
  const touch = 64 * Number.EPSILON * scale;
  let found = 0;
  let a = rootScratch[base] as number;
  let fa = evaluatePolynomial(c, off, d, a);
  if (fa === 0) found = pushRoot(base, found, a, lo, hi);
  for (let i = 1; i < n; i++) {
    const b = rootScratch[base + i] as number;
    const fb = evaluatePolynomial(c, off, d, b);
    if (fb - fb !== 0) overflowed = true;
    if (fb === 0) {
      found = pushRoot(base, found, b, lo, hi);
    } else if (fa !== 0 && (fa < 0) !== (fb < 0)) {
      found = pushRoot(base, found, monotoneRoot(c, off, d, derivativeScratch, dOff, a, b, fa, fb), lo, hi);
    } else if (i < n - 1 && Math.abs(fb) <= touch) {
      // a critical point where the polynomial touches zero without crossing
      found = pushRoot(base, found, b, lo, hi);
    }
    a = b;
    fa = fb;
  }
  return found;
}

/** Coefficients beyond these magnitudes are scaled (by a power of two) before the quadratic formula, whose squares would overflow or underflow. */
const QUADRATIC_HIGH = 2 ** 500;
const QUADRATIC_LOW = 2 ** -500;

function quadraticRoots(c0: number, c1: number, c2: number, lo: number, hi: number, base: number): number {
  const big = Math.max(Math.abs(c0), Math.abs(c1), Math.abs(c2));
  if (big > QUADRATIC_HIGH || big < QUADRATIC_LOW) {
    // two powers of two, so that neither overflows when the coefficients are subnormal
    const e = -Math.ceil(Math.log2(big));
    const s1 = 2 ** Math.trunc(e / 2);
    const s2 = 2 ** (e - Math.trunc(e / 2));
    c0 = c0 * s1 * s2;
    c1 = c1 * s1 * s2;
    c2 = c2 * s1 * s2;
  }
  const disc = c1 * c1 - 4 * c2 * c0;
  if (disc < 0) {
    // a double root lost to rounding: keep it when the vertex value is zero to rounding
    const v = -c1 / (2 * c2);
    const fv = c0 + v * (c1 + v * c2);
    if (Math.abs(fv) <= 64 * Number.EPSILON * (Math.abs(c0) + Math.abs(c1 * v) + Math.abs(c2 * v * v))) return pushRoot(base, 0, v, lo, hi);
    return 0;
  }
  const q = -0.5 * (c1 + (c1 >= 0 ? Math.sqrt(disc) : -Math.sqrt(disc)));
  let r1 = q / c2;
  let r2 = q !== 0 ? c0 / q : r1;
  if (r1 > r2) {
    const t = r1;
    r1 = r2;
    r2 = t;
  }
  const n = pushRoot(base, 0, r1, lo, hi);
  return r2 !== r1 ? pushRoot(base, n, r2, lo, hi) : n;
}

/**
 * Root of a polynomial in (a, b), where it changes sign and is monotone (the interval lies between
 * consecutive roots of its derivative, whose coefficients are `dc[dOff ..]`): Newton's method from
 * the false-position point, kept inside a shrinking bracket; a step that leaves the bracket, or
 * does not halve it every other time, is replaced by bisection, so convergence is guaranteed and
 * quadratic near the root (the safeguarded Newton of Press et al., Numerical Recipes, 3rd ed.,
 * section 9.4).
 */
function monotoneRoot(c: ArrayLike<number>, off: number, d: number, dc: ArrayLike<number>, dOff: number, a: number, b: number, fa: number, fb: number): number {
  // orient so that p(lo) < 0 < p(hi)
  let lo = fa < 0 ? a : b;
  let hi = fa < 0 ? b : a;
  let x = (a * fb - b * fa) / (fb - fa);
  if (!(x > a && x < b)) x = 0.5 * (a + b);
  let older = b - a;
  let step = older;
  let f = evaluatePolynomial(c, off, d, x);
  let df = evaluatePolynomial(dc, dOff, d - 1, x);
  for (let iter = 0; iter < 100; iter++) {
    if (f === 0) return x;
    if (f < 0) lo = x;
    else hi = x;
    const tol = 2 * Number.EPSILON * Math.abs(x) + Number.MIN_VALUE;
    // bisect when Newton would leave the bracket or is not shrinking fast enough
    if (((x - hi) * df - f) * ((x - lo) * df - f) > 0 || Math.abs(2 * f) > Math.abs(older * df)) {
      older = step;
      step = 0.5 * (hi - lo);
      x = lo + step;
    } else {
      older = step;
      step = f / df;
      x -= step;
    }
    if (Math.abs(step) <= tol || Math.abs(hi - lo) <= 2 * tol) return x;
    f = evaluatePolynomial(c, off, d, x);
    df = evaluatePolynomial(dc, dOff, d - 1, x);
  }
  return x;
}

/**
 * True when the polynomial `c[off] + ... + c[off+d] t^d` keeps one sign over `0 <= t <= h`
 * by a wide margin: a bound from its terms (each `c_k t^k` lies between 0 and `c_k h^k`) stays
 * more than 1e-9 of their total size away from zero. Such a polynomial has no root there, nor
 * within the rounding slack {@link polynomialRootsIn} allows at the ends, so root finding on it
 * can be skipped: the cheap test that spares most pieces of a diagram.
 */
export function clearOfZero(c: ArrayLike<number>, off: number, d: number, h: number): boolean {
  let lo = c[off] as number;
  let hi = lo;
  let size = Math.abs(lo);
  let p = 1;
  for (let k = 1; k <= d; k++) {
    p *= h;
    const term = (c[off + k] as number) * p;
    if (term > 0) hi += term;
    else lo += term;
    size += Math.abs(term);
  }
  const margin = 1e-9 * size;
  return lo > margin || hi < -margin;
}
