import { z } from "zod";

export const FIELD_LISTS = ["needs-attention", "customer-changes", "coverage-gaps", "sheet-versions", "sheet-trends"] as const;

const sheetSlug = z.string({ error: "Say which sheet: ?sheet=<slug>." }).regex(/^[a-z0-9-]{1,120}$/, "A sheet slug.");

/** GET /api/v1/vendors/{vendor}/field/{list}[?sheet=slug]: which list to export (sheet-trends also takes ?from&to). */
export const fieldExportSchema = z.discriminatedUnion(
  "list",
  [
    z.object({ list: z.literal("sheet-versions"), sheet: sheetSlug }),
    z.object({ list: z.literal("sheet-trends"), sheet: sheetSlug }),
    z.object({ list: z.enum(["needs-attention", "customer-changes", "coverage-gaps"]) }),
  ],
  { error: `The list must be one of: ${FIELD_LISTS.join(", ")}.` },
);
export type FieldExport = z.infer<typeof fieldExportSchema>;
