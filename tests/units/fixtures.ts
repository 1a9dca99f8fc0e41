import type { QuantityKind } from "../../src/units/index.js";

/** Representative units of each kind (common practice in SI and US customary work). */
export const UNITS_OF: Readonly<Record<QuantityKind, readonly string[]>> = {
  length: ["m", "mm", "cm", "km", "in", "ft", "yd"],
  force: ["N", "kN", "MN", "lbf", "kip", "lb", "kips"],
  moment: ["N*m", "kN*m", "N*mm", "lbf*in", "lbf*ft", "kip*in", "kip*ft", "kip-ft", "kN·m"],
  forcePerLength: ["N/m", "kN/m", "N/mm", "lbf/ft", "lbf/in", "kip/ft", "kip/in", "plf", "klf"],
  stress: ["Pa", "kPa", "MPa", "GPa", "N/mm^2", "N/mm²", "psi", "ksi", "psf", "ksf", "kN/m^2", "lbf/in^2"],
  area: ["m^2", "mm^2", "cm^2", "in^2", "ft^2", "mm2"],
  secondMoment: ["m^4", "mm^4", "cm^4", "in^4", "ft^4", "in4", "mm⁴"],
  sectionModulus: ["m^3", "mm^3", "cm^3", "in^3", "in³"],
  translationalStiffness: ["N/m", "kN/m", "N/mm", "kip/in", "lbf/in"],
  rotationalStiffness: ["N*m/rad", "kN*m/rad", "N*mm/rad", "kip*in/rad", "kip*ft/rad"],
  rotation: ["rad"],
  dimensionless: [],
};
