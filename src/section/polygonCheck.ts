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

// scratch for the sweep (grown as needed; nothing in it outlives a call)
let low = new Float64Array(64);
let high = new Float64Array(64);
let order = new Int32Array(64);

/**
 * The first pair of edges (by index; edge i runs from point i to point i + 1) that makes the
 * polygon non-simple, or undefined when it is simple.
 */
export function findSelfIntersection(zs: readonly number[], ys: readonly number[]): readonly [number, number] | undefined {
  const n = zs.length;
  // folds: an edge that turns straight back along the one before it
  for (let i = 0; i < n; i++) {
    const p = i === 0 ? n - 1 : i - 1;
    const q = i + 1 === n ? 0 : i + 1;
    const zp = zs[p]!, yp = ys[p]!, zi = zs[i]!, yi = ys[i]!, zq = zs[q]!, yq = ys[q]!;
    const cross = orient(zp, yp, zi, yi, zq, yq);
    const dot = (zi - zp) * (zq - zi) + (yi - yp) * (yq - yi);
    if (cross === 0 && dot < 0) return [p, i];
  }
  if (order.length < n) {
    low = new Float64Array(2 * n);
    high = new Float64Array(2 * n);
    order = new Int32Array(2 * n);
  }
  for (let i = 0; i < n; i++) {
    const a = ys[i]!;
    const b = ys[i + 1 === n ? 0 : i + 1]!;
    low[i] = a < b ? a : b;
    high[i] = a < b ? b : a;
  }
  // edges in order of their lowest y (a stable sort: ties keep index order)
  if (n <= 32) {
    for (let i = 0; i < n; i++) {
      const key = low[i]!;
      let k = i;
      while (k > 0 && low[order[k - 1]!]! > key) {
        order[k] = order[k - 1]!;
        k--;
      }
      order[k] = i;
    }
  } else {
    const sorted = Array.from({ length: n }, (_, i) => i).sort((a, b) => low[a]! - low[b]!);
    for (let i = 0; i < n; i++) order[i] = sorted[i]!;
  }
  for (let a = 0; a < n; a++) {
    const i = order[a]!;
    const top = high[i]!;
    const i1 = i + 1 === n ? 0 : i + 1;
    for (let b = a + 1; b < n; b++) {
      const j = order[b]!;
      if (low[j]! > top) break;
      const d = Math.abs(i - j);
      if (d === 1 || d === n - 1) continue; // neighbours share a corner
      const j1 = j + 1 === n ? 0 : j + 1;
      if (segmentsMeet(zs[i]!, ys[i]!, zs[i1]!, ys[i1]!, zs[j]!, ys[j]!, zs[j1]!, ys[j1]!)) return i < j ? [i, j] : [j, i];
    }
  }
  return undefined;
}
