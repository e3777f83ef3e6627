import { z } from "zod";

export const FIELD_LISTS = ["needs-attention", "customer-changes", "coverage-gaps", "sheet-versions"] as const;

/** GET /api/v1/vendors/{vendor}/field/{list}[?sheet=slug]: which list to export. */
export const fieldExportSchema = z.discriminatedUnion(
  "list",
  [
    z.object({
      list: z.literal("sheet-versions"),
      sheet: z.string({ error: "Say which sheet: ?sheet=<slug>." }).regex(/^[a-z0-9-]{1,120}$/, "A sheet slug."),
    }),
    z.object({ list: z.enum(["needs-attention", "customer-changes", "coverage-gaps"]) }),
  ],
  { error: `The list must be one of: ${FIELD_LISTS.join(", ")}.` },
);
export type FieldExport = z.infer<typeof fieldExportSchema>;
