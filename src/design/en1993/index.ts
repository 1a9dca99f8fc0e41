export type { IShapeForEurocode, SteelForEurocode } from "./shape.js";
export { checkEurocodeIShape, checkEurocodeSteel } from "./shape.js";
export type { PartialFactors, SectionClass, PartClass, EurocodeClassification, EurocodeResistance } from "./resistance.js";
export { RECOMMENDED_PARTIAL_FACTORS, classifyEurocodeIShape, eurocodeResistance, bendingWithShear } from "./resistance.js";
export type { BucklingCurve, CriticalMomentOptions, BucklingResistance } from "./ltb.js";
export { IMPERFECTION_FACTORS, criticalMoment, bucklingResistance } from "./ltb.js";
