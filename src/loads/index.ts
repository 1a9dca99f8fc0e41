export type { PointLoad, CoupleLoad, DistributedLoad, Load, LoadResultant } from "./load.js";
export { DEFAULT_LOAD_CASE, pointLoad, coupleLoad, uniformLoad, linearLoad, loadResultant } from "./load.js";
export { validateLoads, POSITION_TOLERANCE } from "./validate.js";
