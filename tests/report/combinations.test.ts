import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeModel, parseModel } from "../../src/model/index.js";
import { REPORT_CAUTION, reportCombinations, textReport } from "../../src/report/index.js";

const file = (name: string): unknown => JSON.parse(readFileSync(join(import.meta.dirname, "..", "..", "examples", "combinations", name), "utf8"));

describe("textReport with load combinations", () => {
  const a = analyzeModel(parseModel(file("roof-beam-asce7.json")));
  const text = textReport(a, { width: 400 });
  const c = a.combinations!;

  it("prints every combination with its factors, purpose and clause", () => {
    expect(text).toContain("LOAD COMBINATIONS (16; factors applied to each case)");
    for (const k of c.combinations) {
      const line = text.split("\n").find((l) => l.includes(` ${k.name} `) && l.includes(k.clause!));
      expect(line, k.name).toBeDefined();
      for (const [name, f] of Object.entries(k.factors)) expect(line).toContain(`${f} x ${name}`);
    }
  });

  it("names the governing combination at each envelope peak and for each reaction, uplift included", () => {
    const moment = text.split("\n").find((l) => l.trimStart().startsWith("bending moment") && l.includes(c.envelopes!.moment.upper.peak.combination));
    expect(moment).toBeDefined();
    expect(moment).toContain(c.envelopes!.moment.lower.peak.combination);
    // wind lifting the canopy: 0.6D - 0.6W pulls the supports down (uplift)
    expect(c.reactions![0]!.force.min.value).toBeLessThan(0);
    expect(text).toContain(c.reactions![0]!.force.min.combination);
  });

  it("gives the utilisation table with the governing row, and keeps the caution", () => {
    const g = c.checks[c.governing!]!;
    expect(text).toContain(`Governing: ${g.group}, ${g.combination}`);
    expect(text).toContain("CHECKS PER COMBINATION");
    expect(text.replace(/\s+/g, " ")).toContain(REPORT_CAUTION.replace(/\s+/g, " "));
  });

  it("is empty for a model without cases", () => {
    const plain = analyzeModel(parseModel({ length: 4, E: 1, I: 1, supports: [{ at: 0, type: "fixed" }], loads: [{ type: "point", at: 4, value: 1 }] }));
    expect(reportCombinations(plain)).toBe("");
    expect(textReport(plain)).not.toContain("LOAD COMBINATIONS");
  });
});
