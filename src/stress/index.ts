export type { FibreExtremes, BendingProperties, BendingPropertiesWithExtremes, UnsymmetricBendingProperties, FibrePoint, ExtremeFibre, FibreStress } from "./types.js";
export { bendingStress, tryBendingStress, bendingStressFromModulus, tryBendingStressFromModulus } from "./flexure.js";
export type { ExtremeBendingStresses } from "./extreme.js";
export { extremeBendingStresses, tryExtremeBendingStresses } from "./extreme.js";
export type { BiaxialMoments, StressPlane, NeutralAxis } from "./biaxial.js";
export { bendingStressPlane, tryBendingStressPlane, biaxialBendingStress, tryBiaxialBendingStress, neutralAxis, tryNeutralAxis } from "./biaxial.js";
export type { PointStress, CornerStresses } from "./corners.js";
export { cornerStresses, tryCornerStresses } from "./corners.js";
export { materialBendingStress, tryMaterialBendingStress } from "./composite.js";
export type { StressLayer, BendingStressProfileOptions, StressProfileSegment, BendingStressProfile } from "./profile.js";
export { bendingStressProfile, tryBendingStressProfile } from "./profile.js";
export type { TrapezoidBand, CircleBand, DepthBand, BandCut } from "./bands.js";
export { cutAt, tryCutAt } from "./bands.js";
export type { ShearProperties } from "./shear.js";
export { shearStress, tryShearStress, shearFlow, tryShearFlow } from "./shear.js";
export type { ShearStressPoint, ShearStressProfile, ShearStressProfileOptions, MaterialShearStress, PartShearStress } from "./shear-profile.js";
export { shearStressAt, tryShearStressAt, peakShearStress, tryPeakShearStress, shearStressProfile, tryShearStressProfile } from "./shear-profile.js";
export type { SectionStressOptions } from "./section-stress.js";
export {
  sectionShearStressAt,
  trySectionShearStressAt,
  sectionShearStressProfile,
  trySectionShearStressProfile,
  sectionPeakShearStress,
  trySectionPeakShearStress,
  sectionCornerStresses,
  trySectionCornerStresses,
} from "./section-stress.js";
export type { PartStress, PartStresses, PartFibreStress } from "./section-parts.js";
export { sectionPartStresses, trySectionPartStresses } from "./section-parts.js";
