// A hand-built analysis of a simply supported beam under a uniform load, written from the
// closed-form results so that report tests do not depend on the solver:
// AISC Steel Construction Manual 15th ed., Table 3-23 case 1 (simple beam, uniformly distributed load):
// R = wL/2, V = w(L/2 - x), M = wx(L - x)/2, max M = wL^2/8 at midspan,
// deflection = wx(L^3 - 2Lx^2 + x^3)/(24EI), max 5wL^4/(384EI) at midspan.
// Member: L = 6 m, w = 10 kN/m, E = 200 GPa, rectangle 100 mm x 300 mm (I = bd^3/12 = 225e6 mm^4),
// so EI = 45 000 kN*m^2, max M = 45 kN*m, max deflection 3.75 mm, extreme stress M c / I = 30 MPa.
import { solveBeam } from "../../src/beam/index.js";
import { DEFAULT_MODEL_UNITS, type Model, type ModelAnalysis, type ModelUnits } from "../../src/model/index.js";

/** The report fixtures use the model format's default units. */
export const UNITS: ModelUnits = DEFAULT_MODEL_UNITS;

const L = 6;
const w = 10;
const EI = 45_000; // kN*m^2
const k = w / (24 * EI); // 1/(kN*m^2) * kN/m

export function simpleSpanModel(overrides: Partial<Model> = {}): Model {
  return {
    format: 1,
    name: "Test beam <B1> & \"quotes\"",
    description: "A simple span under a uniform load, for report tests.",
    units: UNITS,
    length: L,
    E: 200_000,
    section: { shape: "rectangle", dimensions: { width: 100, depth: 300 } },
    supports: [
      { kind: "pin", at: 0 },
      { kind: "roller", at: L, settlement: 0 },
    ],
    hinges: [],
    loads: [{ kind: "distributed", from: 0, to: L, start: w, end: w, case: "live" }],
    limits: { deflection: { kind: "ratio", ratio: 360 }, bendingStress: 165 },
    ...overrides,
  };
}

export function simpleSpanAnalysis(overrides: Partial<ModelAnalysis> = {}): ModelAnalysis {
  const model = simpleSpanModel();
  const deflectionAtMid = -1000 * k * (L ** 3 * 3 - 2 * L * 27 + 81); // mm
  return {
    model,
    units: UNITS,
    scale: {
      length: 1, force: 1000, moment: 1000, forcePerLength: 1000, deflection: 0.001, rotation: 1, stress: 1e6, modulus: 1e6,
      sectionLength: 0.001, area: 1e-6, secondMoment: 1e-12, sectionModulus: 1e-9, translationalStiffness: 1000, rotationalStiffness: 1000,
    },
    reactions: [
      { support: 0, kind: "pin", at: 0, force: 30, moment: 0 },
      { support: 1, kind: "roller", at: L, force: 30, moment: 0 },
    ],
    shear: { max: { value: 30, at: 0 }, min: { value: -30, at: L } },
    moment: { max: { value: 45, at: 3 }, min: { value: 0, at: 0 } },
    slope: { max: { value: k * L ** 3, at: L }, min: { value: -k * L ** 3, at: 0 } },
    deflection: { max: { value: 0, at: 0 }, min: { value: deflectionAtMid, at: 3 } },
    section: {
      shape: "rectangle",
      area: 30_000,
      centroid: { y: 150, z: 50 },
      secondMomentZ: 225e6,
      secondMomentY: 25e6,
      productMoment: 0,
      extremes: { top: 150, bottom: -150 },
      sectionModulus: { top: 1.5e6, bottom: 1.5e6 },
      productMomentYZ: 0,
      sectionModulusTop: 1.5e6,
      sectionModulusBottom: 1.5e6,
      yTop: 150,
      yBottom: 150,
    },
    stress: {
      tension: { value: 30, at: 3, y: -150 },
      compression: { value: -30, at: 3, y: 150 },
    },
    checks: [
      { kind: "deflection", demand: -deflectionAtMid, capacity: (L * 1000) / 360, utilisation: -deflectionAtMid / ((L * 1000) / 360), pass: true, at: 3, unit: "mm", description: "deflection against span/360" },
      { kind: "bending-tension", demand: 30, capacity: 165, utilisation: 30 / 165, pass: true, at: 3, unit: "MPa", description: "bending stress against allowable" },
    ],
    pass: true,
    diagrams: {
      shear: { unit: "kN", pieces: [{ from: 0, to: L, coefficients: [30, -10] }] },
      moment: { unit: "kN*m", pieces: [{ from: 0, to: L, coefficients: [0, 30, -5] }] },
      slope: { unit: "rad", pieces: [{ from: 0, to: L, coefficients: [-k * L ** 3, 0, 6 * L * k, -4 * k] }] },
      deflection: { unit: "mm", pieces: [{ from: 0, to: L, coefficients: [0, -1000 * k * L ** 3, 0, 2000 * k * L, -1000 * k] }] },
    },
    warnings: [],
    // The solver's own result in SI units (N, m), which the report does not read.
    solution: solveBeam({
      length: L,
      stiffness: EI * 1000,
      supports: [
        { kind: "pin", at: 0 },
        { kind: "roller", at: L },
      ],
      loads: [{ kind: "distributed", from: 0, to: L, start: w * 1000, end: w * 1000 }],
    }),
    ...overrides,
  };
}
