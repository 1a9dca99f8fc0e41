export * from "./aisc360/index.js";
export * from "./en1993/index.js";
