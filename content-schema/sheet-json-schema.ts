import { z } from "zod";

import { sheetFrontMatterSchema } from "./sheet-front-matter";

export const SHEET_FRONT_MATTER_SCHEMA_ID = "https://swarfbook.example/schemas/sheet-front-matter.schema.json";

/** JSON Schema of the front matter as authors write it (the input side: quantities are strings). */
export function sheetFrontMatterJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(sheetFrontMatterSchema, { io: "input", target: "draft-2020-12" });
  return { ...schema, $id: SHEET_FRONT_MATTER_SCHEMA_ID, title: "Swarfbook sheet front matter" };
}
