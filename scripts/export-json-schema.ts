// Writes the JSON Schema of sheet front matter for editors: node --import tsx scripts/export-json-schema.ts
import { writeFileSync } from "node:fs";
import path from "node:path";

import { sheetFrontMatterJsonSchema } from "../content-schema/sheet-json-schema";

const target = path.resolve(import.meta.dirname, "../content-schema/sheet-front-matter.schema.json");
writeFileSync(target, `${JSON.stringify(sheetFrontMatterJsonSchema(), null, 2)}\n`);
console.log(`wrote ${path.relative(process.cwd(), target)}`);
