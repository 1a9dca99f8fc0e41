// `npm run bench` runs this file: import every module's benchmarks, then run them.
// `npm run bench -- <regex>` runs only the benchmarks whose names match.
// package.json lists ./bench/** under "sideEffects", so the bundler that runs this file keeps these imports.
import { runAll } from "./harness.js";
import "./errors.bench.js";
import "./report.bench.js";
import "./units.bench.js";
import "./math.bench.js";
import "./beam.bench.js";
import "./stress.bench.js";
import "./check.bench.js";
import "./section.bench.js";
import "./model.bench.js";
import "./sheet.bench.js";
import "./combine.bench.js";
import "./design.bench.js";
import "./moving.bench.js";

const pattern = process.argv[2];
await runAll(pattern ? new RegExp(pattern) : undefined);
