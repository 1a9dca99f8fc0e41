// Writes examples/sheet/mezzanine.xlsx, the example workbook of examples/sheet/mezzanine.ts.
// Run: node node_modules/.bin/unrun examples/sheet/build-workbook.ts [out.xlsx]
import { resolve } from "node:path";
import { mezzanineWorkbook } from "./mezzanine.js";

const out = resolve(process.argv[2] ?? resolve(import.meta.dirname, "mezzanine.xlsx"));
await mezzanineWorkbook().xlsx.writeFile(out);
console.log(`wrote ${out}`);
