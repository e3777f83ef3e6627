import "server-only";

import { readDb } from "@/lib/db/read-db";
import { listProblemReports, type ProblemReport } from "@/lib/tickets/problem-reports";

import { listSheetChanges, type ChangeItem } from "./customer-changes";
import { readRollup, type VersionRollup } from "./rollup-rows";

export type LinkedTicket = { id: string; number: number; subject: string; status: string; versionNumber: number; createdAt: string };

export type SheetFieldResults = {
  sheet: { id: string; slug: string; title: string; machineClass: string };
  versions: (VersionRollup & { title: string; changeNote: string })[];
  changes: ChangeItem[];
  tickets: LinkedTicket[];
  handoffs: (ProblemReport & { versionNumber: number | null })[];
};

export type FieldSheet = { id: string; slug: string; title: string; machineClass: string };

/** The sheet under this vendor, with the title of its latest readable version and its machine class. */
export async function findFieldSheet({ vendorId, slug }: { vendorId: string; slug: string }): Promise<FieldSheet | null> {
  const db = await readDb();
  const row = await db("sheets as s")
    .join("machine_classes as mc", function () {
      this.on("mc.id", "s.machine_class_id").andOn("mc.vendor_id", "s.vendor_id");
    })
    .where({ "s.vendor_id": vendorId, "s.slug": slug })
    .first(
      "s.id",
      "s.slug",
      "mc.name as machine_class",
      db.raw(
        "(select v.title from sheet_versions v where v.sheet_id = s.id and v.vendor_id = s.vendor_id and v.state in ('published', 'superseded', 'withdrawn') order by v.number desc limit 1) as title",
      ),
    );
  return row
    ? {
        id: String(row.id),
        slug: String(row.slug),
        title: row.title ? String(row.title) : String(row.slug),
        machineClass: String(row.machine_class),
      }
    : null;
}

/** Everything Field results knows about one sheet, version by version (oldest first). */
export async function findSheetFieldResults({
  vendorId,
  sheetId,
  z,
}: {
  vendorId: string;
  sheetId: string;
  z: number;
}): Promise<SheetFieldResults | null> {
  const db = await readDb();
  const sheet = await db("sheets as s")
    .join("machine_classes as mc", function () {
      this.on("mc.id", "s.machine_class_id").andOn("mc.vendor_id", "s.vendor_id");
    })
    .where({ "s.vendor_id": vendorId, "s.id": sheetId })
    .first("s.id", "s.slug", "mc.name as machine_class");
  if (!sheet) return null;
  const [rollups, changes, tickets, handoffs] = await Promise.all([
    db("field_version_rollups as r")
      .join("sheet_versions as v", function () {
        this.on("v.id", "r.sheet_version_id").andOn("v.vendor_id", "r.vendor_id");
      })
      .where({ "r.vendor_id": vendorId, "r.sheet_id": sheetId })
      .orderBy("r.number")
      .select("r.*", "v.title", "v.change_note"),
    listSheetChanges({ vendorId, sheetId }),
    // Tickets are the one place a customer shows up: they opened them and the Desk answers them.
    db("ticket_sheet_links as l")
      .join("tickets as t", function () {
        this.on("t.id", "l.ticket_id").andOn("t.vendor_id", "l.vendor_id");
      })
      .join("sheet_versions as v", function () {
        this.on("v.id", "l.sheet_version_id").andOn("v.vendor_id", "l.vendor_id");
      })
      .where({ "l.vendor_id": vendorId, "v.sheet_id": sheetId })
      .orderBy("t.created_at", "desc")
      .select("t.id", "t.number", "t.subject", "t.status", "t.created_at", "v.number as version_number"),
    listProblemReports({ vendorId, sheetId }),
  ]);
  const numberOf = new Map(rollups.map((r) => [String(r.sheet_version_id), Number(r.number)]));
  const latest = rollups[rollups.length - 1];
  return {
    sheet: { id: sheet.id, slug: sheet.slug, title: latest ? String(latest.title) : sheet.slug, machineClass: sheet.machine_class },
    versions: rollups.map((r) => ({ ...readRollup(r, z), title: String(r.title), changeNote: String(r.change_note ?? "") })),
    changes,
    tickets: tickets.map((t) => ({
      id: t.id,
      number: t.number,
      subject: t.subject,
      status: t.status,
      versionNumber: Number(t.version_number),
      createdAt: new Date(t.created_at).toISOString(),
    })),
    handoffs: handoffs
      .filter((h) => numberOf.has(h.sheetVersionId))
      .map((h) => ({ ...h, versionNumber: numberOf.get(h.sheetVersionId) ?? null })),
  };
}
