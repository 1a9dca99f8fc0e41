import { bench, suite } from "./harness.js";
import { conversionFactor, convert, convertQuantity, formatQuantity, parseQuantity, unitFactor } from "../src/units/index.js";

let fresh = 0;
const compounds = ["kip*ft/rad", "lbf*in^2/(ft*in)", "kN*m^2/mm", "N*mm/(in*ft)", "kip/(in*ft)"];

suite("units", () => {
  bench("units: parseQuantity with a cached unit (\"1.5 kip/ft\")", () => parseQuantity("1.5 kip/ft", "forcePerLength"));
  bench("units: parseQuantity with a cached SI unit (\"12 kN*m\")", () => parseQuantity("12 kN*m", "moment"));
  bench("units: unitFactor of a new compound unit (uncached)", () => {
    // Spaces placed differently each time give 1000 distinct texts, more than the cache holds
    // (256), so every call parses; the grammar ignores the spaces.
    fresh = (fresh + 1) % 1000;
    const unit = compounds[fresh % compounds.length]!;
    return unitFactor(`${" ".repeat(fresh % 40)}${unit}${" ".repeat(Math.floor(fresh / 40))}`);
  });
  bench("units: convertQuantity(\"29000 ksi\", stress, \"MPa\")", () => convertQuantity("29000 ksi", "stress", "MPa"));
  bench("units: convert(12.5, \"kip*ft\", \"kN*m\")", () => convert(12.5, "kip*ft", "kN*m"));
  bench("units: conversionFactor then multiply 1000 values", () => {
    const k = conversionFactor("kip/ft", "kN/m");
    let s = 0;
    for (let i = 0; i < 1000; i++) s += i * k;
    return s;
  });
  bench("units: formatQuantity(12345, \"kN*m\")", () => formatQuantity(12345, "kN*m"));
});
