import { z } from "zod";

/** What the adapt panel reports when a reader adapts a sheet version: a counter, no machine, no person. */
export const sheetActivitySchema = z.strictObject({
  versionId: z.uuid("versionId must be a sheet version id."),
  kind: z.literal("adaptation", { error: 'kind must be "adaptation".' }),
});
export type SheetActivity = z.infer<typeof sheetActivitySchema>;
