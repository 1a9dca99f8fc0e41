// The browser proof's workload, shared by the page (in Chromium) and the test (in Node), so both run exactly
// the same calls on the same built files. Invented members; the answers are compared, not asserted here.
// `lib` holds the package's modules: { flexura, model, report, section }.

/** Runs a beam, a section, a model analysis, a text report and the SVG diagrams; returns plain JSON. */
export function runScenario(lib) {
  const { solveBeam, evaluatePiecewise, iSection, sectionProperties } = lib.flexura;
  const beam = solveBeam({
    length: 6,
    stiffness: 20000,
    supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }],
    loads: [
      { kind: "distributed", from: 0, to: 6, start: 5, end: 5 },
      { kind: "point", at: 2, value: 20 },
    ],
  });
  const section = sectionProperties(iSection({ depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8, rootRadius: 8.9 }));
  const model = lib.model.parseModel({
    name: "Browser proof member",
    units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
    length: 6.6,
    E: "200 GPa",
    supports: [{ at: 0, type: "pin" }, { at: 5.4, type: "roller" }],
    loads: [
      { type: "distributed", start: 12 },
      { type: "point", at: 2.2, value: 9 },
    ],
    section: { shape: "i-section", depth: 350, flangeWidth: 170, flangeThickness: 14, webThickness: 8 },
    limits: { deflection: "span/360", bendingStress: "165 MPa" },
  });
  const analysis = lib.model.analyzeModel(model);
  const report = lib.report.textReport(analysis);
  const diagrams = lib.report.reportDiagrams(analysis);
  const sectionOnly = lib.section.sectionProperties(lib.section.rectangle({ width: 150, depth: 300 }));
  return {
    reactions: beam.reactions.map((r) => r.force),
    momentMax: beam.peaks.moment.max.value,
    momentMaxAt: beam.peaks.moment.max.at,
    deflectionMin: beam.peaks.deflection.min.value,
    momentAt3: evaluatePiecewise(beam.moment, 3),
    sectionArea: section.area,
    sectionSecondMomentZ: section.secondMomentZ,
    rectangleSecondMomentZ: sectionOnly.secondMomentZ,
    analysis: lib.model.analysisToJson(analysis),
    reportLength: report.length,
    reportHasCaution: report.includes(lib.report.REPORT_CAUTION.slice(0, 40)),
    diagramNames: diagrams.map((d) => d.name),
    svgs: diagrams.map((d) => d.svg),
  };
}
