// Simplicity check for polygons: no two non-adjacent edges meet, and no edge folds back on the
// one before it. Edges are swept in order of their lowest y so that only edges whose height
// ranges overlap are compared.

function orient(az: number, ay: number, bz: number, by: number, cz: number, cy: number): number {
  return (bz - az) * (cy - ay) - (by - ay) * (cz - az);
}

function onSegment(az: number, ay: number, bz: number, by: number, cz: number, cy: number): boolean {
  return Math.min(az, bz) <= cz && cz <= Math.max(az, bz) && Math.min(ay, by) <= cy && cy <= Math.max(ay, by);
}

function segmentsMeet(
  az: number, ay: number, bz: number, by: number,
  cz: number, cy: number, dz: number, dy: number,
): boolean {
  const o1 = orient(az, ay, bz, by, cz, cy);
  const o2 = orient(az, ay, bz, by, dz, dy);
  const o3 = orient(cz, cy, dz, dy, az, ay);
  const o4 = orient(cz, cy, dz, dy, bz, by);
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) return true;
  if (o1 === 0 && onSegment(az, ay, bz, by, cz, cy)) return true;
  if (o2 === 0 && onSegment(az, ay, bz, by, dz, dy)) return true;
  if (o3 === 0 && onSegment(cz, cy, dz, dy, az, ay)) return true;
  if (o4 === 0 && onSegment(cz, cy, dz, dy, bz, by)) return true;
  return false;
}

/**
 * The first pair of edges (by index; edge i runs from point i to point i + 1) that makes the
 * polygon non-simple, or undefined when it is simple.
 */
export function findSelfIntersection(zs: readonly number[], ys: readonly number[]): readonly [number, number] | undefined {
  const n = zs.length;
  const z = (i: number): number => zs[i % n] ?? 0;
  const y = (i: number): number => ys[i % n] ?? 0;
  // folds: an edge that turns straight back along the one before it
  for (let i = 0; i < n; i++) {
    const p = (i + n - 1) % n;
    const cross = orient(z(p), y(p), z(i), y(i), z(i + 1), y(i + 1));
    const dot = (z(i) - z(p)) * (z(i + 1) - z(i)) + (y(i) - y(p)) * (y(i + 1) - y(i));
    if (cross === 0 && dot < 0) return [p, i];
  }
  const order = Array.from({ length: n }, (_, i) => i);
  const low = order.map((i) => Math.min(y(i), y(i + 1)));
  const high = order.map((i) => Math.max(y(i), y(i + 1)));
  order.sort((a, b) => (low[a] ?? 0) - (low[b] ?? 0));
  for (let a = 0; a < n; a++) {
    const i = order[a] ?? 0;
    const top = high[i] ?? 0;
    for (let b = a + 1; b < n; b++) {
      const j = order[b] ?? 0;
      if ((low[j] ?? 0) > top) break;
      const d = Math.abs(i - j);
      if (d === 1 || d === n - 1) continue; // neighbours share a corner
      if (segmentsMeet(z(i), y(i), z(i + 1), y(i + 1), z(j), y(j), z(j + 1), y(j + 1))) return i < j ? [i, j] : [j, i];
    }
  }
  return undefined;
}
