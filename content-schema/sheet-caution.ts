import { z } from "zod";

import { cautionKindSchema } from "./sheet-kinds";

/** A hazard the reader must know about before cutting. */
export const sheetCautionSchema = z.strictObject({
  kind: cautionKindSchema,
  text: z.string().trim().min(1).max(500),
});

export type SheetCaution = z.output<typeof sheetCautionSchema>;
