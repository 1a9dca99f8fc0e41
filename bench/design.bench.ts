import { bench, suite } from "./harness.js";
import { solveBeam, type BeamInput } from "../src/beam/index.js";
import {
  availableFlexuralStrength,
  bucklingResistance,
  checkSteelBeam,
  criticalMoment,
  eurocodeResistance,
  momentGradient,
  nominalFlexureRectangularHss,
  nominalFlexureRoundHss,
  nominalFlexureSolidBar,
  nominalFlexureTee,
  type IShapeForDesign,
  type IShapeForEurocode,
  type RectangularHssForDesign,
} from "../src/design/index.js";

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

// An IPE 300-like section in S235 (N, mm), three 2 m segments of a 6 m member.
const ipe: IShapeForEurocode = {
  rolled: true,
  depth: 300,
  flangeWidth: 150,
  flangeThickness: 10.7,
  webThickness: 7.1,
  rootRadius: 15,
  area: 5381,
  elasticModulus: 557.1e3,
  plasticModulus: 628.4e3,
  minorMomentOfInertia: 603.8e4,
  torsionConstant: 20.12e4,
  warpingConstant: 125.9e9,
};
const s235 = { elasticModulus: 210_000, shearModulus: 81_000, yieldStrength: 235 };
function eurocodeThreeSegments(): number {
  let least = Infinity;
  const section = eurocodeResistance(ipe, s235);
  for (const c1 of [1.13, 1.0, 1.13]) least = Math.min(least, bucklingResistance(ipe, s235, criticalMoment(ipe, s235, 2000, { momentShapeFactor: c1 }), "rolled").resistance, section.bending);
  return least;
}

// The same member as a channel (F2 with c) and, per segment with C_b from the exact moment diagram,
// as an invented 12 x 6 rectangular HSS (F7), a round HSS (F8), a tee (F9) and a solid bar (F11).
const channel: IShapeForDesign = { ...shape, form: "channel", flangeWidth: 3.75, warpingConstant: 1900 };
const hss: RectangularHssForDesign = { axis: "major", flangeWidth: 5.3, webHeight: 11.3, wallThickness: 0.233, sectionModulus: 27.4, plasticModulus: 33.3, area: 7.6, torsionConstant: 125, minorRadiusOfGyration: 2.47 };
const round = { outsideDiameter: 10.75, wallThickness: 0.34, sectionModulus: 29.9, plasticModulus: 39.3 };
const wt = { stem: "tension", depth: 9, flangeWidth: 7.5, flangeThickness: 0.57, stemThickness: 0.355, sectionModulus: 5.66, flangeSectionModulus: 19.8, plasticModulus: 10.1, minorMomentOfInertia: 20, minorRadiusOfGyration: 1.65, torsionConstant: 0.6 } as const;
const bar = { kind: "rectangular", depth: 8, width: 2 } as const;
function otherChapters(): number {
  let total = 0;
  for (const [from, to] of [[0, 120], [120, 240], [240, 360]] as const) {
    const cb = momentGradient(solution.moment, from, to).factor;
    const lb = to - from;
    total += availableFlexuralStrength(nominalFlexureRectangularHss(hss, steel, lb, cb).nominal, "lrfd");
    total += availableFlexuralStrength(nominalFlexureRoundHss(round, steel).nominal, "lrfd");
    total += availableFlexuralStrength(nominalFlexureTee(wt, steel, lb).nominal, "lrfd");
    total += availableFlexuralStrength(nominalFlexureSolidBar(bar, steel, lb, cb).nominal, "lrfd");
  }
  return total;
}

suite("design", () => {
  bench("design: checkSteelBeam AISC 360-16 on a channel (F2 with c), three segments, LRFD", () => checkSteelBeam(solution, channel, steel, options));
  bench("design: F7, F8, F9 and F11 over three segments with C_b (12 strengths)", () => otherChapters());
  bench("design: solveBeam alone (the member checked below)", () => solveBeam(input));
  bench("design: checkSteelBeam AISC 360-16, three segments, LRFD (beyond the solve)", () => checkSteelBeam(solution, shape, steel, options));
  bench("design: EN 1993-1-1 section resistance and three segments' M_b,Rd (6.3.2.3)", () => eurocodeThreeSegments());
});
