import { bench, suite } from "./harness.js";
import { solveBeam } from "../src/beam/index.js";
import { checkLoadCombinations, checkMember, memberStresses, selfWeight, spanDeflections, type MemberSection } from "../src/check/index.js";
import { presetCombinations, solveCases, type LoadCase } from "../src/combine/index.js";

// An invented two-span floor beam with an overhang (N, mm), rectangular 200 x 400 section.
const b = 200;
const h = 400;
const section: MemberSection = {
  properties: { secondMomentZ: (b * h ** 3) / 12, extremes: { top: h / 2, bottom: -h / 2 } },
  shear: [{ kind: "trapezoid", yBottom: -h / 2, yTop: h / 2, widthBottom: b, widthTop: b }],
};
const solution = solveBeam({
  length: 14000,
  stiffness: 200_000 * section.properties.secondMomentZ,
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6000 }, { kind: "roller", at: 12000 }],
  loads: [
    { kind: "distributed", from: 0, to: 14000, start: 8, end: 8 },
    { kind: "point", at: 3000, value: 20000 },
    { kind: "point", at: 14000, value: 5000 },
  ],
});
const limits = { bendingStress: 20, shearStress: 1.2, deflection: { kind: "ratio", ratio: 360 } } as const;

// The same member with its cases: self-weight, superimposed dead, patterned live (N, mm).
const own = selfWeight(14000, b * h, 5e-6, { case: "SW" });
const cases: LoadCase[] = [own.case, { name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }];
const solved = solveCases(
  {
    length: 14000,
    stiffness: 200_000 * section.properties.secondMomentZ,
    supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6000 }, { kind: "roller", at: 12000 }],
    loads: [...own.loads, { kind: "distributed", from: 0, to: 14000, start: 3, end: 3, case: "D" }, { kind: "distributed", from: 0, to: 14000, start: 5, end: 5, case: "L" }],
  },
  cases,
);
const asd = presetCombinations("asce7-16-allowable-stress", cases).combinations;
const groups = {
  stress: [{ name: "allowable stress", combinations: asd, limits: { bendingStress: 20, shearStress: 1.2 } }],
  deflection: [
    { name: "live", factors: { L: 1 }, limit: { kind: "ratio", ratio: 360 } },
    { name: "total", factors: { SW: 1, D: 1, L: 1 }, limit: { kind: "ratio", ratio: 240 } },
  ],
} as const;

suite("check", () => {
  bench(`check: checkLoadCombinations (${asd.length} ASD combinations and 2 deflection groups, live patterned on 3 spans)`, () => checkLoadCombinations(solved, section, groups));
  bench("check: memberStresses (two spans and an overhang)", () => memberStresses(solution, section));
  bench("check: spanDeflections (two spans and an overhang)", () => spanDeflections(solution));
  bench("check: checkMember (bending, shear, deflection)", () => checkMember(solution, section, limits));
});
