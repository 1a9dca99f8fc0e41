export * from "./aisc360/index.js";
