import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeModel, parseModel } from "../../src/model/index.js";
import { envelopeDiagramSvg, governingChanges, reportDiagrams } from "../../src/report/index.js";
import { expectWellFormedSvg } from "./svg-check.js";

const model = (name: string): unknown => JSON.parse(readFileSync(join(import.meta.dirname, "..", "..", "examples", "combinations", name), "utf8"));

describe("envelope drawings", () => {
  const a = analyzeModel(parseModel(model("floor-beam-en1990.json")));
  const e = a.combinations!.envelopes!;

  it("reportDiagrams adds the shear, moment and deflection envelopes for a model with combinations", () => {
    expect(reportDiagrams(a).map((d) => d.name)).toEqual(["member", "shear", "moment", "deflection", "section", "shear-envelope", "moment-envelope", "deflection-envelope"]);
  });

  it("governingChanges lists the start of every piece whose governing combination differs from the one before", () => {
    const changes = governingChanges(e.moment.upper);
    expect(changes[0]).toEqual({ at: 0, combination: e.moment.upper.governing[0] });
    for (let i = 1; i < changes.length; i++) expect(changes[i]!.combination).not.toBe(changes[i - 1]!.combination);
    const distinct = e.moment.upper.governing.filter((g, i, all) => i === 0 || g !== all[i - 1]).length;
    expect(changes).toHaveLength(distinct);
    // live on span 1 governs the first span's sagging and another arrangement elsewhere: the bound changes at least once
    expect(changes.length).toBeGreaterThan(1);
  });

  it("draws both bounds, marks each change of governing combination and labels the peaks with their combinations", () => {
    const svg = envelopeDiagramSvg({ title: "moment envelope", length: a.model.length, lengthUnit: "m", envelope: e.moment });
    expectWellFormedSvg(svg);
    expect(svg.match(/class="upper"/g)).toHaveLength(1);
    expect(svg.match(/class="lower"/g)).toHaveLength(1);
    expect(svg.match(/class="governing-change"/g)).toHaveLength(governingChanges(e.moment.upper).length + governingChanges(e.moment.lower).length);
    expect(svg).toContain(e.moment.upper.peak.combination);
    expect(svg).toContain(e.moment.lower.peak.combination);
  });
});
