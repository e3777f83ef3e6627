import "server-only";

import { db } from "@/lib/db/knex";

export type CustomerContext = {
  machines: {
    id: string;
    name: string;
    rpmMin: number;
    rpmMax: number;
    powerKw: number;
    maxFeedMmMin: number;
    rigidity: number;
    units: "metric" | "imperial";
  }[];
  setups: { id: string; name: string; sheetVersionId: string; sheetTitle: string; versionNumber: number; machineName: string }[];
  pastTickets: { id: string; number: number; subject: string; status: string; createdAt: string }[];
};

/** What the agent sees beside a ticket: the customer's machines, saved setups and other tickets. */
export async function getCustomerContext({
  vendorId,
  customerId,
  excludeTicketId,
}: {
  vendorId: string;
  customerId: string;
  excludeTicketId?: string;
}): Promise<CustomerContext> {
  const [machines, setups, tickets] = await Promise.all([
    db("machines").where({ vendor_id: vendorId, user_id: customerId }).orderBy("name"),
    db("setups as s")
      .join("sheet_versions as v", "v.id", "s.sheet_version_id")
      .join("machines as m", "m.id", "s.machine_id")
      .where({ "s.vendor_id": vendorId, "s.user_id": customerId, "v.vendor_id": vendorId })
      .orderBy("s.updated_at", "desc")
      .limit(20)
      .select("s.id", "s.name", "s.sheet_version_id", "v.title", "v.number", "m.name as machine_name"),
    db("tickets")
      .where({ vendor_id: vendorId, customer_id: customerId })
      .modify((q) => (excludeTicketId ? q.whereNot("id", excludeTicketId) : q))
      .orderBy("created_at", "desc")
      .limit(20)
      .select("id", "number", "subject", "status", "created_at"),
  ]);
  return {
    machines: machines.map((m) => ({
      id: m.id,
      name: m.name,
      rpmMin: m.rpm_min,
      rpmMax: m.rpm_max,
      powerKw: m.power_kw,
      maxFeedMmMin: m.max_feed_mm_min,
      rigidity: m.rigidity,
      units: m.units,
    })),
    setups: setups.map((s) => ({
      id: s.id,
      name: s.name,
      sheetVersionId: s.sheet_version_id,
      sheetTitle: s.title,
      versionNumber: s.number,
      machineName: s.machine_name,
    })),
    pastTickets: tickets.map((t: { id: string; number: number; subject: string; status: string; created_at: Date }) => ({
      id: t.id,
      number: t.number,
      subject: t.subject,
      status: t.status,
      createdAt: new Date(t.created_at).toISOString(),
    })),
  };
}
