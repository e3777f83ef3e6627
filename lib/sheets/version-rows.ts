import "server-only";

import type { Knex } from "knex";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";
import { db } from "@/lib/db/knex";
import type { SheetRow, SheetVersionRow } from "@/lib/db/tables";

import type { SheetRecord, SheetVersion } from "./sheet-types";

/** A sheet_versions row with the names of the people on it (see `versionQuery`). */
export type VersionWithNamesRow = SheetVersionRow & {
  author_name: string | null;
  updated_by_name: string | null;
  approved_by_name: string | null;
};

export const rowToSheet = (r: SheetRow): SheetRecord => ({
  id: r.id,
  slug: r.slug,
  cutterId: r.cutter_id,
  materialId: r.material_id,
  machineClassId: r.machine_class_id,
  createdBy: r.created_by,
});

export const hasFrontMatter = (fm: unknown): fm is SheetFrontMatter => typeof fm === "object" && fm !== null && "operations" in fm;

/** Stored front matter with its operations re-parsed from the author's text (null when the column holds none). */
export const storedFrontMatter = (fm: unknown): SheetFrontMatter | null =>
  hasFrontMatter(fm) ? { ...fm, operations: readStoredOperations(fm) } : null;

export const rowToVersion = (r: VersionWithNamesRow): SheetVersion => ({
  id: r.id,
  sheetId: r.sheet_id,
  number: r.number,
  state: r.state,
  title: r.title,
  source: r.source,
  frontMatter: hasFrontMatter(r.front_matter) ? r.front_matter : null,
  changeNote: r.change_note,
  revision: r.revision,
  authorId: r.author_id,
  authorName: r.author_name,
  updatedBy: r.updated_by,
  updatedByName: r.updated_by_name,
  submittedAt: r.submitted_at,
  approvedBy: r.approved_by,
  approvedByName: r.approved_by_name,
  approvedAt: r.approved_at,
  publishedAt: r.published_at,
  supersededAt: r.superseded_at,
  withdrawnAt: r.withdrawn_at,
  withdrawnReason: r.withdrawn_reason,
  createdAt: r.created_at,
  updatedAt: r.updated_at,
});

/** sheet_versions with the names of the people on it; always filtered by vendor. */
export function versionQuery(vendorId: string, trx: Knex = db) {
  return trx("sheet_versions as v")
    .leftJoin("users as au", "au.id", "v.author_id")
    .leftJoin("users as uu", "uu.id", "v.updated_by")
    .leftJoin("users as pu", "pu.id", "v.approved_by")
    .where("v.vendor_id", vendorId)
    .select<VersionWithNamesRow[]>("v.*", "au.name as author_name", "uu.name as updated_by_name", "pu.name as approved_by_name");
}
