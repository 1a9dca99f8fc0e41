import { bench, suite } from "./harness.js";
import { analysisToJson, analyzeModel, parseModel } from "../src/model/index.js";

// An invented model: a steel floor beam over three supports with an overhang, a section and limits.
const file = {
  name: "bench floor beam",
  units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
  length: 9,
  E: "200 GPa",
  supports: [
    { at: 0, type: "pin" },
    { at: 4, type: "spring", stiffness: "5000 kN/m" },
    { at: 7.5, type: "roller", settlement: "5 mm" },
  ],
  loads: [
    { type: "point", at: 2, value: 18, case: "dead" },
    { type: "moment", at: 9, value: 4 },
    { type: "distributed", from: 0, to: 9, start: 3, end: 5, case: "live" },
  ],
  section: { shape: "i-section", depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8 },
  limits: { deflection: "span/360", bendingStress: "165 MPa", shearStress: "95 MPa" },
};
const model = parseModel(file);
const analysis = analyzeModel(model);

suite("model", () => {
  bench("model: parseModel of a typical model file", () => parseModel(file));
  bench("model: analyzeModel (solve, section, stresses, checks)", () => analyzeModel(model));
  bench("model: parse + analyze + analysisToJson", () => analysisToJson(analyzeModel(parseModel(file))));
  bench("model: analysisToJson alone", () => analysisToJson(analysis));
});
