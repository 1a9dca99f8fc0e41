import { describe, expect, it } from "vitest";
import { analyzeModel, parseModel } from "../../../src/model/index.js";
import { formatReportNumber, sectionStressFigure } from "../../../src/report/index.js";
import { examples, overlappingPairs, textBoxesOf } from "./helpers.js";

describe("sectionStressFigure", () => {
  const flitch = examples().find((e) => e.file === "flitch-ridge-beam.json")!;

  it("shows each material's own peak bending and shear stress, as the analysis found them (transformed section, checked against a hand calculation in tests/model/shapes.test.ts)", () => {
    const figure = sectionStressFigure(flitch.analysis)!;
    const st = flitch.analysis.stress!;
    // The steel plate carries the governing stress, n times the timber's at the same fibre.
    const steel = Math.max(Math.abs(st.tension.value), Math.abs(st.compression.value));
    expect(figure.svg).toContain(`steel plate: sigma ${formatReportNumber(-steel, 3)} MPa (allowable 165)`);
    const timberCheck = flitch.analysis.checks.find((c) => c.kind === "bending-compression" && c.part === 0)!;
    expect(figure.svg).toContain(`timber: sigma ${formatReportNumber(-timberCheck.demand, 3)} MPa (allowable 12)`);
    for (const p of st.shearByPart!) expect(figure.svg).toContain(`tau ${formatReportNumber(p.value, 3)} MPa`);
    // The jump at the material boundary: the plate's stress at the top fibre is the timber's times n = E_steel / E_timber.
    expect(steel / timberCheck.demand).toBeCloseTo(200000 / 11000, 6);
  });

  it("draws no two texts over each other, on every example with a section", () => {
    for (const e of examples()) {
      const figure = sectionStressFigure(e.analysis);
      if (figure === undefined) continue;
      expect(overlappingPairs(textBoxesOf(figure.svg)).map(([a, b]) => `${a.text} / ${b.text}`)).toEqual([]);
    }
  });

  it("is absent for a member without a section", () => {
    const plain = analyzeModel(parseModel({ format: 1, length: 4, E: 200000, I: 8e7, supports: [{ type: "pin", at: 0 }, { type: "roller", at: 4 }], loads: [{ type: "point", at: 2, value: 5 }] }));
    expect(sectionStressFigure(plain)).toBeUndefined();
  });
});
