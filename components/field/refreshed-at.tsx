import { lastFieldRefresh } from "@/lib/field/refresh-rollups";
import { formatDateTime } from "@/lib/ui/dates";

/** When the rollups were last brought up to date. */
export async function RefreshedAt() {
  const refreshed = await lastFieldRefresh();
  return <>{refreshed ? formatDateTime(refreshed) : "the next refresh"}</>;
}
