// Report benchmarks: the text report and every SVG diagram of a typical member (a simple span
// with a section, built as data so that the figures measure the report alone, not the solver).
import { reportDiagrams, textReport, type DrawnSectionPart } from "../src/report/index.js";
import { simpleSpanAnalysis } from "../tests/report/fixture.js";
import { bench, suite } from "./harness.js";

const analysis = simpleSpanAnalysis();
const outline: readonly DrawnSectionPart[] = [{ points: [[0, 0], [100, 0], [100, 300], [0, 300]], hole: false, material: "timber" }];

suite("report", () => {
  bench("report: text report of a simple span with a section", () => textReport(analysis));
  bench("report: all five SVG diagrams of a simple span", () => reportDiagrams(analysis, { sectionOutline: outline }));
});
