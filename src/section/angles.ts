// Trigonometry that is exact at multiples of a quarter turn, so that parts placed at right
// angles (fillets, quarter discs, rotated plates) keep exact coordinates.

const QUARTER = Math.PI / 2;

/** cos(angle), exact (0, 1 or -1) within 1e-12 rad of a multiple of pi/2. */
export function cosExact(angle: number): number {
  const k = Math.round(angle / QUARTER);
  if (Math.abs(angle - k * QUARTER) < 1e-12) {
    const m = ((k % 4) + 4) % 4;
    return m === 0 ? 1 : m === 2 ? -1 : 0;
  }
  return Math.cos(angle);
}

/** sin(angle), exact (0, 1 or -1) within 1e-12 rad of a multiple of pi/2. */
export function sinExact(angle: number): number {
  const k = Math.round(angle / QUARTER);
  if (Math.abs(angle - k * QUARTER) < 1e-12) {
    const m = ((k % 4) + 4) % 4;
    return m === 1 ? 1 : m === 3 ? -1 : 0;
  }
  return Math.sin(angle);
}
