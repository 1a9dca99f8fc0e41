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

// An invented flitch beam: two timber plies and a steel plate with bolt holes, a built-up section of two materials.
const box = (z0: number, z1: number) => ({ type: "polygon", points: [{ y: 0, z: z0 }, { y: 0, z: z1 }, { y: 240, z: z1 }, { y: 240, z: z0 }] });
const flitch = parseModel({
  length: 4.8,
  material: { name: "timber", E: "11 GPa" },
  section: {
    shape: "built-up",
    parts: [
      box(0, 45),
      { ...box(45, 55), material: { name: "steel", E: "200 GPa" }, bendingStress: "165 MPa" },
      box(55, 100),
      { type: "circle", centre: { y: 120, z: 22.5 }, radius: 7, hole: true },
      { type: "circle", centre: { y: 120, z: 77.5 }, radius: 7, hole: true },
    ],
  },
  supports: [{ at: 0, type: "pin" }, { at: 4.8, type: "roller" }],
  loads: [{ type: "distributed", start: 2.2 }, { type: "point", at: 1.6, value: 1.5 }],
  limits: { deflection: "span/300", bendingStress: "12 MPa", shearStress: "1.8 MPa" },
});
const analysis = analyzeModel(model);

// The same span under 5,000 equal point loads (invented): parse and analyse stay linear in the loads.
const crowdedFile = { ...file, loads: Array.from({ length: 5000 }, (_, i) => ({ type: "point", at: (9 * (i + 0.5)) / 5000, value: 0.01 })) };
const crowded = parseModel(crowdedFile);

suite("model", () => {
  bench("model: parseModel of a typical model file", () => parseModel(file));
  bench("model: analyzeModel (solve, section, stresses, checks)", () => analyzeModel(model));
  bench("model: parse + analyze + analysisToJson", () => analysisToJson(analyzeModel(parseModel(file))));
  bench("model: analysisToJson alone", () => analysisToJson(analysis));
  bench("model: analyzeModel (built-up section of two materials, checks part by part)", () => analyzeModel(flitch));
  bench("model: parseModel of 5,000 point loads", () => parseModel(crowdedFile));
  bench("model: analyzeModel of 5,000 point loads", () => analyzeModel(crowded));
});
