// Writes schema/flexura-model.schema.json from the schema object in src/model (the one source).
// Run by `npm run schema`; tests/model/schema.test.ts fails when the file is out of date.
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { modelSchema } from "../src/model/schema.js";

const file = join(import.meta.dirname, "..", "schema", "flexura-model.schema.json");
writeFileSync(file, `${JSON.stringify(modelSchema, null, 2)}\n`);
console.log(`wrote ${file}`);
