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
  const low: number[] = [];
  const high: number[] = [];
  const order: number[] = [];
  for (let i = 0; i < n; i++) {
    const p = i === 0 ? n - 1 : i - 1;
    const q = i + 1 === n ? 0 : i + 1;
    // folds: an edge that turns straight back along the one before it
    const zp = zs[p]!, yp = ys[p]!, zi = zs[i]!, yi = ys[i]!, zq = zs[q]!, yq = ys[q]!;
    if (orient(zp, yp, zi, yi, zq, yq) === 0 && (zi - zp) * (zq - zi) + (yi - yp) * (yq - yi) < 0) return [p, i];
    low.push(Math.min(yi, yq));
    high.push(Math.max(yi, yq));
    order.push(i);
  }
  // edges in order of their lowest y (a stable sort: ties keep index order)
  order.sort((a, b) => low[a]! - low[b]!);
  for (let a = 0; a < n; a++) {
    const i = order[a]!;
    const i1 = i + 1 === n ? 0 : i + 1;
    for (let b = a + 1; b < n; b++) {
      const j = order[b]!;
      if (low[j]! > high[i]!) break;
      const d = Math.abs(i - j);
      if (d === 1 || d === n - 1) continue; // neighbours share a corner
      const j1 = j + 1 === n ? 0 : j + 1;
      if (segmentsMeet(zs[i]!, ys[i]!, zs[i1]!, ys[i1]!, zs[j]!, ys[j]!, zs[j1]!, ys[j1]!)) return i < j ? [i, j] : [j, i];
    }
  }
  return undefined;
}
