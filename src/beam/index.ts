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
  BeamNote,
} from "./types.js";
export { solveBeam, trySolveBeam } from "./solve.js";
