import { z } from "zod";

export type JsonSchema = Record<string, unknown>;

/** A zod schema as JSON Schema 2020-12 (the dialect of OpenAPI 3.1); requests as accepted, answers as sent. */
export function jsonSchemaOf(schema: z.ZodType, io: "input" | "output"): JsonSchema {
  const { $schema: _dialect, ...rest } = z.toJSONSchema(schema, { io, unrepresentable: "any", target: "draft-2020-12" }) as JsonSchema;
  return rest;
}

/** The properties of an object schema, or of every branch of a union of objects. */
export function propertiesOf(schema: JsonSchema): { properties: Record<string, JsonSchema>; required: Set<string> } {
  const branches = (schema.anyOf ?? schema.oneOf) as JsonSchema[] | undefined;
  if (branches) {
    const parts = branches.map(propertiesOf);
    const properties = Object.assign({}, ...parts.map((p) => p.properties)) as Record<string, JsonSchema>;
    const required = new Set([...parts[0].required].filter((name) => parts.every((p) => p.required.has(name))));
    return { properties, required };
  }
  if (schema.allOf) {
    const parts = (schema.allOf as JsonSchema[]).map(propertiesOf);
    return { properties: Object.assign({}, ...parts.map((p) => p.properties)), required: new Set(parts.flatMap((p) => [...p.required])) };
  }
  return { properties: (schema.properties ?? {}) as Record<string, JsonSchema>, required: new Set((schema.required ?? []) as string[]) };
}
