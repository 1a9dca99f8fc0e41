// Report benchmarks: the text report and every SVG diagram of a typical member (a simple span
// with a section, built as data so that the figures measure the report alone, not the solver).
import { reportDiagrams, textReport, type DrawnSectionPart } from "../src/report/index.js";
import { simpleSpanAnalysis } from "../tests/report/fixture.js";
import { bench, suite } from "./harness.js";
import { analyzeModel, parseModel } from "../src/model/index.js";

const analysis = simpleSpanAnalysis();
const outline: readonly DrawnSectionPart[] = [{ points: [[0, 0], [100, 0], [100, 300], [0, 300]], hole: false, material: "timber" }];

// An invented simple span under 5,000 equal point loads: the drawing work must stay linear in the pieces.
const crowded = analyzeModel(
  parseModel({
    length: 6,
    E: "200 GPa",
    I: "8.5e7 mm^4",
    supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }],
    loads: Array.from({ length: 5000 }, (_, i) => ({ type: "point", at: (6 * (i + 0.5)) / 5000, value: 0.002 })),
  }),
);

suite("report", () => {
  bench("report: all SVG diagrams of a span with 5,000 point loads", () => reportDiagrams(crowded));
  bench("report: text report of a simple span with a section", () => textReport(analysis));
  bench("report: all five SVG diagrams of a simple span", () => reportDiagrams(analysis, { sectionOutline: outline }));
});
