import "server-only";

import type { Knex } from "knex";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";

import type { SheetRecord, SheetVersion } from "./sheet-types";

type Row = Record<string, unknown>;

export const rowToSheet = (r: Row): SheetRecord => ({
  id: r.id as string,
  slug: r.slug as string,
  cutterId: r.cutter_id as string,
  materialId: r.material_id as string,
  machineClassId: r.machine_class_id as string,
  createdBy: (r.created_by as string | null) ?? null,
});

const hasFrontMatter = (fm: unknown): fm is SheetFrontMatter => typeof fm === "object" && fm !== null && "operations" in fm;

export const rowToVersion = (r: Row): SheetVersion => ({
  id: r.id as string,
  sheetId: r.sheet_id as string,
  number: r.number as number,
  state: r.state as SheetVersion["state"],
  title: r.title as string,
  source: r.source as string,
  frontMatter: hasFrontMatter(r.front_matter) ? r.front_matter : null,
  changeNote: r.change_note as string,
  revision: r.revision as number,
  authorId: (r.author_id as string | null) ?? null,
  authorName: (r.author_name as string | null) ?? null,
  updatedBy: (r.updated_by as string | null) ?? null,
  updatedByName: (r.updated_by_name as string | null) ?? null,
  submittedAt: (r.submitted_at as Date | null) ?? null,
  approvedBy: (r.approved_by as string | null) ?? null,
  approvedByName: (r.approved_by_name as string | null) ?? null,
  approvedAt: (r.approved_at as Date | null) ?? null,
  publishedAt: (r.published_at as Date | null) ?? null,
  supersededAt: (r.superseded_at as Date | null) ?? null,
  withdrawnAt: (r.withdrawn_at as Date | null) ?? null,
  withdrawnReason: (r.withdrawn_reason as string | null) ?? null,
  createdAt: r.created_at as Date,
  updatedAt: r.updated_at as Date,
});

/** sheet_versions with the names of the people on it; always filtered by vendor. */
export function versionQuery(vendorId: string, trx: Knex = db) {
  return trx("sheet_versions as v")
    .leftJoin("users as au", "au.id", "v.author_id")
    .leftJoin("users as uu", "uu.id", "v.updated_by")
    .leftJoin("users as pu", "pu.id", "v.approved_by")
    .where("v.vendor_id", vendorId)
    .select("v.*", "au.name as author_name", "uu.name as updated_by_name", "pu.name as approved_by_name");
}
