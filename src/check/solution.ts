import type { BeamSolution } from "../beam/index.js";

/**
 * What the checks read from a solved member: a {@link BeamSolution} from `solveBeam` fits.
 * Shear, moment and deflection are exact piecewise polynomials of x.
 */
export type CheckedSolution = Pick<BeamSolution, "length" | "shear" | "moment" | "deflection" | "spans">;
