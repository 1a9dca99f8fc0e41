export type {
  BeamInput,
  StiffnessSegment,
  SolveOptions,
  BeamSolution,
  Reaction,
  BeamPeaks,
  BeamSpan,
  BeamWarning,
  BeamResidual,
} from "./types.js";
export { solveBeam, trySolveBeam } from "./solve.js";
