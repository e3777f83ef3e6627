import { z } from "zod";

const optional = z
  .string()
  .trim()
  .max(120)
  .optional()
  .transform((v) => v || undefined);

/** GET /api/v1/vendors/{vendor}/sheets: optional filters by slug. */
export const sheetListQuerySchema = z.object({
  cutter: optional.describe("A cutter's SKU."),
  material: optional.describe("A material's slug."),
  machineClass: optional.describe("A machine class's slug."),
});

/** GET /api/v1/vendors/{vendor}/cutters/{sku}/qr */
export const cutterQrQuerySchema = z.object({
  format: z.enum(["png", "svg"]).default("png").catch("png"),
  download: z.string().max(8).optional().describe("Any value: answer as a file download."),
});

/** POST /api/v1/vendors/{vendor}/tickets/{ticket}/messages */
export const ticketMessageSchema = z.object({ body: z.string().trim().min(1).max(20_000) });

/** How many of a ticket's latest messages a thread shows when it is folded. */
export const LATEST_THREAD_MESSAGES = 30;

/** GET /api/v1/vendors/{vendor}/tickets/{ticket} and the ticket pages: the thread folded to its latest messages, or all of it. */
export const ticketThreadQuerySchema = z.object({
  messages: z
    .enum(["latest", "all"])
    .default("latest")
    .catch("latest")
    .describe(
      `latest: the question and the ${LATEST_THREAD_MESSAGES} latest messages, with earlierCount for the rest; all: every message.`,
    ),
});

export type ThreadMessages = z.infer<typeof ticketThreadQuerySchema>["messages"];

/** How many sheet versions the reply editor's picker offers at a time. */
export const PICKER_VERSIONS = 25;

/** GET /api/v1/vendors/{vendor}/desk/sheet-versions: sheet versions a staff reply can embed, found by words. */
export const pickerVersionQuerySchema = z.object({
  q: z
    .string()
    .trim()
    .max(120)
    .default("")
    .describe(
      "Words that must all appear in the version's title, cutter SKU, material or machine class; empty: the first current versions.",
    ),
});
