export type { SectionPoint, Material, PolygonPart, CirclePart, SectorPart, FilletPart, SectionPart, Section, BoundingBox } from "./types.js";
export { section, trySection } from "./construct.js";
export type {
  SectionPropertiesOptions,
  SectionProperties,
  PrincipalAxes,
  ExtremeFibres,
  SectionModuli,
  PartProperties,
  TransformedInfo,
  RadiiOfGyration,
} from "./propertyTypes.js";
export { sectionProperties, trySectionProperties } from "./properties.js";
export type { FirstMomentAbove } from "./firstMoment.js";
export { firstMomentAbove, tryFirstMomentAbove } from "./firstMoment.js";
export type { ShapeOptions } from "./shapes/dimensions.js";
export type { RectangleDimensions } from "./shapes/rectangle.js";
export { rectangle, tryRectangle } from "./shapes/rectangle.js";
export type { CircleDimensions, PipeDimensions } from "./shapes/circular.js";
export { circle, pipe, tryCircle, tryPipe } from "./shapes/circular.js";
export type { ISectionDimensions } from "./shapes/iSection.js";
export { iSection, tryISection } from "./shapes/iSection.js";
export type { TeeDimensions } from "./shapes/tee.js";
export { tee, tryTee } from "./shapes/tee.js";
export type { MirrorAxis } from "./transform.js";
export { translatePart, rotatePart, mirrorPart, translateSection, rotateSection, mirrorSection } from "./transform.js";
export type { SecondMomentsAbout } from "./about.js";
export { secondMomentAbout, trySecondMomentAbout } from "./about.js";
export type { PlasticProperties, PlasticMoments } from "./plastic.js";
export { plasticProperties, tryPlasticProperties } from "./plastic.js";
export type { RectangularHollowDimensions } from "./shapes/rectangularHollow.js";
export { rectangularHollow, tryRectangularHollow } from "./shapes/rectangularHollow.js";
export type { ChannelDimensions } from "./shapes/channel.js";
export { channel, tryChannel } from "./shapes/channel.js";
export type { AngleDimensions } from "./shapes/angle.js";
export { angle, tryAngle } from "./shapes/angle.js";
export type { PlateDimensions, PlateGirderDimensions } from "./shapes/plateGirder.js";
export { plateGirder, tryPlateGirder } from "./shapes/plateGirder.js";
export { builtUp, tryBuiltUp } from "./shapes/builtUp.js";
export { torsionConstantThinWalled, tryTorsionConstantThinWalled } from "./torsion.js";
export type { PartOutline, OutlinesOptions } from "./outlines.js";
export { outlines, tryOutlines } from "./outlines.js";
export { connectedPieces, tryConnectedPieces } from "./connected.js";
export type { WallPlate, WallModel } from "./wallModel.js";
export { centreLineModel, tryCentreLineModel } from "./centreLine.js";
export type { SectorialPoint, OpenSectionProperties } from "./openSection.js";
export { openSectionProperties, tryOpenSectionProperties } from "./openSection.js";
export type { ClosedSectionTorsion } from "./closedTorsion.js";
export { closedSectionTorsion, tryClosedSectionTorsion } from "./closedTorsion.js";
export type { ExactTorsion } from "./torsionExact.js";
export { torsionConstantExact, tryTorsionConstantExact } from "./torsionExact.js";
export { torsionConstantRolledI, torsionConstantRolledTee, tryTorsionConstantRolledI, tryTorsionConstantRolledTee } from "./torsionRolled.js";
export type { PrincipalSides, PrincipalBending, PrincipalAxisProperties } from "./principalModuli.js";
export { principalAxisProperties, tryPrincipalAxisProperties } from "./principalModuli.js";
export type { FullyPlasticMoments } from "./fullyPlastic.js";
export { fullyPlasticMoments, tryFullyPlasticMoments } from "./fullyPlastic.js";
