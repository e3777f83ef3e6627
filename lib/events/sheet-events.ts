import { z } from "zod";

// What happened to a sheet or the catalogue; subscribers (search index, change alerts, rollups) react in jobs.
export const sheetEventSchema = z.discriminatedUnion("type", [
  z.object({
    type: z.literal("version.published"),
    vendorId: z.uuid(),
    sheetId: z.uuid(),
    versionId: z.uuid(),
    supersededVersionId: z.uuid().nullable(),
    batchId: z.uuid().optional(),
  }),
  z.object({ type: z.literal("version.withdrawn"), vendorId: z.uuid(), sheetId: z.uuid(), versionId: z.uuid() }),
  z.object({
    type: z.literal("catalogue.changed"),
    vendorId: z.uuid(),
    entity: z.enum(["cutter", "material", "machine_class"]),
    entityId: z.uuid(),
  }),
]);
export type SheetEvent = z.infer<typeof sheetEventSchema>;

export const SHEET_EVENTS_QUEUE = "sheet.events";

/** A feature's reaction to sheet events; the list of them is in `subscribers.ts`. */
export type SheetEventSubscriber = { name: string; handle: (event: SheetEvent) => Promise<void> };
