import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

import { sheetFrontMatterJsonSchema } from "@/content-schema/sheet-json-schema";

const file = path.resolve(import.meta.dirname, "../../../content-schema/sheet-front-matter.schema.json");

describe("exported JSON Schema", () => {
  it("matches the zod schema (run scripts/export-json-schema.ts after a schema change)", () => {
    expect(JSON.parse(readFileSync(file, "utf8"))).toEqual(sheetFrontMatterJsonSchema());
  });

  it("describes the input side: quantities are strings, unknown keys are refused", () => {
    const schema = sheetFrontMatterJsonSchema() as {
      additionalProperties: boolean;
      required: string[];
      properties: { operations: { items: { properties: Record<string, { type: string }>; additionalProperties: boolean } } };
    };
    const op = schema.properties.operations.items;
    expect(op.properties.vf.type).toBe("string");
    expect(op.properties.ae.type).toBe("string");
    expect(op.additionalProperties).toBe(false);
    expect(schema.additionalProperties).toBe(false);
    expect(schema.required).toEqual(expect.arrayContaining(["title", "cutter", "material", "machineClass", "operations"]));
    expect(schema.required).not.toContain("tags");
  });
});
