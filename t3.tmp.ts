import { exactRoute, naiveRoute } from "./bench/combine.bench.ts";
const med = (a: number[]) => { const s = [...a].sort((x, y) => x - y); return s[s.length >> 1]!; };
const ex: number[] = [], nv: number[] = [];
for (let r = 0; r < 40; r++) {
  let t0 = performance.now(); for (let i = 0; i < 20; i++) exactRoute(); ex.push((performance.now() - t0) / 20 * 1000);
  t0 = performance.now(); for (let i = 0; i < 4; i++) naiveRoute(); nv.push((performance.now() - t0) / 4 * 1000);
}
console.log("exact median us", med(ex).toFixed(0), "min", Math.min(...ex).toFixed(0), "naive median", med(nv).toFixed(0), "min", Math.min(...nv).toFixed(0), "ratio of medians", (med(nv) / med(ex)).toFixed(2));
