import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";

import type { SheetRecord, SheetVersion } from "./sheet-types";
import { rowToSheet, rowToVersion, versionQuery } from "./version-rows";

export async function findSheet({
  vendorId,
  slug,
  trx = db,
  lock = false,
}: {
  vendorId: string;
  slug: string;
  trx?: Knex;
  lock?: boolean;
}): Promise<SheetRecord | null> {
  const query = trx("sheets").where({ vendor_id: vendorId, slug });
  const row = await (lock ? query.forUpdate() : query).first();
  return row ? rowToSheet(row) : null;
}

export async function getSheet(options: { vendorId: string; slug: string; trx?: Knex; lock?: boolean }): Promise<SheetRecord> {
  const sheet = await findSheet(options);
  if (!sheet) throw new NotFound("No such sheet.");
  return sheet;
}

export async function findOpenDraft({
  vendorId,
  sheetId,
  trx = db,
}: {
  vendorId: string;
  sheetId: string;
  trx?: Knex;
}): Promise<SheetVersion | null> {
  const row = await versionQuery(vendorId, trx).where("v.sheet_id", sheetId).whereIn("v.state", ["draft", "in_review"]).first();
  return row ? rowToVersion(row) : null;
}

/** Locks the sheet row (serialising state changes of one sheet) and returns it with its open draft. */
export async function lockOpenDraft({ vendorId, slug, trx }: { vendorId: string; slug: string; trx: Knex.Transaction }) {
  const sheet = await getSheet({ vendorId, slug, trx, lock: true });
  const draft = await findOpenDraft({ vendorId, sheetId: sheet.id, trx });
  if (!draft) throw new Conflict("This sheet has no open draft. Start a new version first.");
  return { sheet, draft };
}

export async function listVersions({
  vendorId,
  sheetId,
  trx = db,
}: {
  vendorId: string;
  sheetId: string;
  trx?: Knex;
}): Promise<SheetVersion[]> {
  return (await versionQuery(vendorId, trx).where("v.sheet_id", sheetId).orderBy("v.number", "desc")).map(rowToVersion);
}

export async function findVersion({
  vendorId,
  sheetId,
  number,
  trx = db,
}: {
  vendorId: string;
  sheetId: string;
  number: number;
  trx?: Knex;
}): Promise<SheetVersion | null> {
  const row = await versionQuery(vendorId, trx).where({ "v.sheet_id": sheetId, "v.number": number }).first();
  return row ? rowToVersion(row) : null;
}
