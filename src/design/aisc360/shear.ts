// Shear strength of the web of a doubly symmetric I-shape without transverse stiffeners, AISC 360-16 G2.1.
import { checkIShape, checkSteel, type IShapeForDesign, type SteelForDesign } from "./shape.js";

/** A nominal shear strength by G2.1 and its resistance and safety factors. */
export interface NominalShear {
  /** V_n = 0.6 F_y A_w C_v1 (G2-1), force. */
  readonly nominal: number;
  /** A_w = d t_w (length^2). */
  readonly webArea: number;
  /** The web shear strength coefficient C_v1 (G2-2 or G2-3 with k_v = 5.34), dimensionless. */
  readonly coefficient: number;
  /** phi_v: 1.00 under G2.1(a), 0.90 otherwise. */
  readonly resistanceFactor: number;
  /** Omega_v: 1.50 under G2.1(a), 1.67 otherwise. */
  readonly safetyFactor: number;
  /** Which paragraph applied: `"G2.1(a)"` (rolled web, h/t_w <= 2.24 sqrt(E/F_y)) or `"G2.1(b)"`. */
  readonly clause: "G2.1(a)" | "G2.1(b)";
}

/**
 * The nominal shear strength of the web of a doubly symmetric I-shape bent about its major
 * axis, without transverse stiffeners (k_v = 5.34), by AISC 360-16 G2.1: V_n = 0.6 F_y A_w C_v1
 * (G2-1) with A_w = d t_w. Rolled webs with h/t_w <= 2.24 sqrt(E/F_y) take C_v1 = 1.0, phi_v =
 * 1.00 and Omega_v = 1.50 (G2.1(a)); otherwise phi_v = 0.90, Omega_v = 1.67, C_v1 = 1.0 while
 * h/t_w <= 1.10 sqrt(k_v E/F_y) (G2-2) and 1.10 sqrt(k_v E/F_y) / (h/t_w) beyond (G2-3).
 * Tension field action (G2.2) is not used.
 *
 * @example
 * ```ts
 * nominalShear(w18x50, { elasticModulus: 29000, yieldStrength: 50 }).nominal; // 192 kips
 * ```
 */
export function nominalShear(shape: IShapeForDesign, steel: SteelForDesign): NominalShear {
  shape = checkIShape(shape);
  steel = checkSteel(steel);
  const { elasticModulus: E, yieldStrength: Fy } = steel;
  const ratio = shape.webHeight / shape.webThickness;
  const webArea = shape.depth * shape.webThickness;
  // G2.1(a) is for rolled I-shaped members only; channels take G2.1(b)
  const rolledLimit = shape.rolled && shape.form !== "channel" && ratio <= 2.24 * Math.sqrt(E / Fy);
  const kv = 5.34;
  const limit = 1.1 * Math.sqrt((kv * E) / Fy);
  const coefficient = rolledLimit || ratio <= limit ? 1 : limit / ratio;
  return Object.freeze({
    nominal: 0.6 * Fy * webArea * coefficient,
    webArea,
    coefficient,
    resistanceFactor: rolledLimit ? 1 : 0.9,
    safetyFactor: rolledLimit ? 1.5 : 1.67,
    clause: rolledLimit ? "G2.1(a)" : "G2.1(b)",
  });
}
