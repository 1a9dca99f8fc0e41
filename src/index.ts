/**
 * flexura: beams and cross-sections for the engineers who size them.
 *
 * Sign conventions: x runs from the left end; loads positive downward; reactions positive
 * upward; bending moment positive when sagging; deflection positive upward.
 *
 * @packageDocumentation
 */
export * from "./errors/index.js";
export * from "./math/index.js";
export * from "./loads/index.js";
export * from "./supports/index.js";
export * from "./beam/index.js";
export * from "./section/index.js";
export * from "./model/index.js";
export * from "./stress/index.js";
// The member checks are served from `flexura/check` only: re-exporting them here would put the
// main entry over its size budget (scripts/size-check.mjs).
// Units (parsing, exact conversion, formatting) work at the edges, in model files, reports and
// the sheet wrapper, and are served from `flexura/units` only: the engines never need them, and
// re-exporting them here would put the main entry over its size budget (scripts/size-check.mjs).
