// The `flexura/beam` package entry: the beam engine with the loads, supports and piecewise
// polynomials it is used with. Re-exports only.
export * from "./index.js";
export * from "../loads/index.js";
export * from "../supports/index.js";
export * from "../math/index.js";
export * from "../errors/index.js";
