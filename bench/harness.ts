// Benchmark harness: mitata measures, we print medians (p50) so figures can be quoted.
// Usage: each bench file calls `suite("module", () => { bench(...) })`; bench/index.ts imports them all.
import { bench, group, run } from "mitata";

export { bench };

/** Registers the benchmarks of one module under a group name. */
export function suite(name: string, register: () => void): void {
  group(name, register);
}

function formatTime(ns: number): string {
  if (ns < 1e3) return `${ns.toFixed(1)} ns`;
  if (ns < 1e6) return `${(ns / 1e3).toFixed(2)} us`;
  if (ns < 1e9) return `${(ns / 1e6).toFixed(2)} ms`;
  return `${(ns / 1e9).toFixed(2)} s`;
}

/** Runs every registered benchmark (optionally only names matching `filter`) and prints a median table. */
export async function runAll(filter?: RegExp): Promise<Map<string, number>> {
  const result = await run(filter ? { format: "quiet", filter } : { format: "quiet" });
  const medians = new Map<string, number>();
  const rows: string[] = [];
  for (const b of result.benchmarks) {
    for (const r of b.runs) {
      if (!r.stats) continue;
      const name = r.name;
      medians.set(name, r.stats.p50);
      rows.push(`${name.padEnd(64)} ${formatTime(r.stats.p50).padStart(12)}  (p75 ${formatTime(r.stats.p75)}, n=${r.stats.samples.length})`);
    }
  }
  console.log(`${"benchmark".padEnd(64)} ${"median".padStart(12)}`);
  for (const row of rows) console.log(row);
  return medians;
}
