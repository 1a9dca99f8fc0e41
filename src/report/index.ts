export { escapeXml } from "./escape.js";
export { svgNumber, svgElement, svgText, svgPolyline, svgPolygon, svgDocument, type SvgAttributes } from "./svg.js";
export { formatReportNumber, formatReportQuantity, snapToZero, textTable, utilisationText } from "./format.js";
export { sampleDiagram, diagramValueAt, SAMPLE_BUDGET, type SampleDiagramOptions } from "./sample.js";
export { lineDiagramSvg, type LineDiagramData, type LineDiagramOptions, type DiagramPeak } from "./line-diagram.js";
export type { MemberDrawing, DrawnSupport, DrawnSupportType, DrawnLoad } from "./member-drawing.js";
export { memberSvg, type MemberSvgOptions } from "./member-svg.js";
export { sectionSvg, type SectionDrawing, type DrawnSectionPart } from "./section-svg.js";
export { REPORT_CAUTION } from "./caution.js";
export { reportInputs } from "./text-inputs.js";
export { reportForces, reportSection, reportChecks } from "./text-results.js";
export { reportCombinations } from "./text-combinations.js";
export { envelopeDiagramSvg, governingChanges, type EnvelopeDiagramData, type GoverningChange } from "./envelope-svg.js";
export { textReport, type TextReportOptions, type TextReportInput } from "./text-report.js";
export { reportDiagrams, type ReportDiagram, type ReportDiagramName, type ReportDiagramsOptions } from "./diagrams.js";
export {
  calculationSheet,
  calculationBook,
  calculationFigure,
  sectionStressFigure,
  type SectionStressFigureOptions,
  figureDocument,
  placeLabels,
  textBox,
  boxesOverlap,
  defaultCandidates,
  LABEL_FONT,
  CHARACTER_ADVANCE,
  sha256Hex,
  printedUnit,
  FLEXURA_VERSION,
  type CalculationSheetJob,
  type CalculationSheetInput,
  type CalculationSheetOptions,
  type CalculationBookMember,
  type CalculationFigure,
  type CalculationFigureOptions,
  type LabelBox,
  type LabelAnchor,
  type LabelCandidate,
  type LabelRequest,
  type PlacedLabel,
  type LabelPlacement,
} from "./document/index.js";
