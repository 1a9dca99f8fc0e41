export type {
  Model,
  ModelUnits,
  ModelQuantityKind,
  ModelSupport,
  ModelPointLoad,
  ModelCoupleLoad,
  ModelDistributedLoad,
  ModelLoad,
  ModelSegment,
  ModelDeflectionLimit,
  ModelLimits,
  ModelMaterial,
} from "./model.js";
export type {
  ModelSection,
  ModelShapeName,
  ModelShapeSection,
  ModelPlate,
  ModelWebPlate,
  ModelPlateGirderSection,
  ModelSectionPoint,
  ModelPolygonPart,
  ModelCirclePart,
  ModelSectorPart,
  ModelFilletPart,
  ModelSectionPart,
  ModelBuiltUpSection,
} from "./section-types.js";
export { MODEL_FORMAT_VERSION } from "./model.js";
export type {
  ModelPresetCombinations,
  ModelCombinationEntry,
  ModelSelfWeight,
  ModelCombinationSelection,
  ModelStressGroup,
  ModelDeflectionGroup,
  ModelCheckGroups,
  ModelGoverningExtreme,
  ModelEnvelopeBound,
  ModelEnvelope,
  ModelGoverningReaction,
  ModelReactionEnvelope,
  ModelReactionRange,
  ModelEnvelopes,
  ModelCombinationCheck,
  ModelCombinationCheckRow,
  ModelCombinationResults,
} from "./combination-types.js";
export type {
  ModelAnalysis,
  ModelResults,
  ModelExtreme,
  ModelPeaks,
  ModelReaction,
  ModelDiagram,
  ModelDiagramPiece,
  ModelDiagrams,
  ModelSectionResult,
  ModelStress,
  ModelStressExtreme,
  ModelShearStressExtreme,
  ModelPartShearStress,
  ModelCheck,
  ModelWarning,
  ModelScale,
} from "./analysis.js";
export type { ModelFile, ModelFileUnits, ModelFileSupport, ModelFileLoad, ModelQuantity } from "./file.js";
export type {
  ModelFileSection,
  ModelFileShapeSection,
  ModelFilePlateGirderSection,
  ModelFileBuiltUpSection,
  ModelFileSectionPart,
  ModelFilePartCommon,
  ModelFilePoint,
  ModelFileMaterial,
} from "./file-section.js";
export type { ModelJsonSchema } from "./schema.js";
export { modelSchema, MODEL_SCHEMA_ID } from "./schema.js";
export { MODEL_LIST_LIMIT } from "./schema-parts.js";
export { parseModel, tryParseModel } from "./parse.js";
export { modelToJson } from "./to-json.js";
export { DEFAULT_MODEL_UNITS } from "./units.js";
export { analyzeModel, tryAnalyzeModel } from "./analyze.js";
export { evaluateDiagram } from "./diagrams.js";
export type { ModelAnalysisJson } from "./analysis-json.js";
export { analysisToJson } from "./analysis-json.js";
