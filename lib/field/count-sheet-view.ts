import "server-only";

import { recordSheetActivity } from "./record-activity";

/** A Library page view, counted for Field results; a failure is logged and never reaches the reader. */
export async function countSheetView(vendorId: string, versionId: string): Promise<void> {
  try {
    await recordSheetActivity({ vendorId, versionId, kind: "views" });
  } catch (error) {
    console.error("[field] could not count a sheet view", error);
  }
}
