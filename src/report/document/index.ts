export { calculationSheet, calculationBook, type CalculationSheetJob, type CalculationSheetInput, type CalculationSheetOptions, type CalculationBookMember } from "./sheet.js";
export { calculationFigure, figureDocument, type CalculationFigure, type CalculationFigureOptions } from "./figure.js";
export { placeLabels, textBox, boxesOverlap, defaultCandidates, LABEL_FONT, CHARACTER_ADVANCE, type LabelBox, type LabelAnchor, type LabelCandidate, type LabelRequest, type PlacedLabel, type LabelPlacement } from "./labels.js";
export { sha256Hex } from "./sha256.js";
export { printedUnit } from "./units.js";
export { FLEXURA_VERSION } from "./version.js";
export { sectionStressFigure, type SectionStressFigureOptions } from "./section-figure.js";
