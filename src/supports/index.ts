export type { Support, SupportKind } from "./support.js";
export { restrainsDeflection, restrainsRotation, restrainsAxis } from "./support.js";
export { validateSupports } from "./validate.js";
