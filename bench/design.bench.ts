import { bench, suite } from "./harness.js";
import { solveBeam, type BeamInput } from "../src/beam/index.js";
import { checkSteelBeam, type IShapeForDesign } from "../src/design/index.js";

// An invented floor beam (kip, in, ksi): a 30 ft simple span braced at its third
// points (three unbraced segments) under one factored combination, uniform plus two point loads.
const shape: IShapeForDesign = {
  rolled: true,
  depth: 18,
  flangeWidth: 7.5,
  flangeThickness: 0.57,
  webThickness: 0.355,
  webHeight: 16.05,
  sectionModulus: 88.9,
  plasticModulus: 101,
  minorMomentOfInertia: 40.1,
  minorRadiusOfGyration: 1.65,
  torsionConstant: 1.24,
  warpingConstant: 3040,
};
const steel = { elasticModulus: 29000, yieldStrength: 50 };
const input: BeamInput = {
  length: 360,
  stiffness: 29000 * 800,
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 360 }],
  loads: [
    { kind: "distributed", from: 0, to: 360, start: 0.12, end: 0.12 },
    { kind: "point", at: 100, value: 8 },
    { kind: "point", at: 250, value: 6 },
  ],
};
const solution = solveBeam(input);
const options = { method: "lrfd", braces: [120, 240] } as const;

suite("design", () => {
  bench("design: solveBeam alone (the member checked below)", () => solveBeam(input));
  bench("design: checkSteelBeam AISC 360-16, three segments, LRFD (beyond the solve)", () => checkSteelBeam(solution, shape, steel, options));
});
