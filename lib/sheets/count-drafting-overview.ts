import "server-only";

import { db } from "@/lib/db/knex";

export type DraftingOverview = { cutters: number; materials: number; machineClasses: number; versionsByState: Record<string, number> };

export async function countDraftingOverview({ vendorId }: { vendorId: string }): Promise<DraftingOverview> {
  const count = async (table: string) => Number((await db(table).where({ vendor_id: vendorId }).count<{ n: string }[]>("id as n"))[0].n);
  const states = await db("sheet_versions")
    .where({ vendor_id: vendorId })
    .groupBy("state")
    .select("state")
    .count<{ state: string; n: string }[]>("id as n");
  return {
    cutters: await count("cutters"),
    materials: await count("materials"),
    machineClasses: await count("machine_classes"),
    versionsByState: Object.fromEntries(states.map((s) => [s.state, Number(s.n)])),
  };
}
