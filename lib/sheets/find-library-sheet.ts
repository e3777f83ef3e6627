import "server-only";

import type { Knex } from "knex";

import { findCutterById, findMachineClassById, findMaterialById } from "@/lib/catalogue/find-catalogue-item";
import { readDb } from "@/lib/db/read-db";

import { findSheet } from "./find-sheet";
import { READABLE_STATES, type SheetVersion } from "./sheet-types";
import { rowToVersion, versionQuery } from "./version-rows";

/**
 * What a Library reader may see of a sheet: the requested version (default: the published one, else the
 * latest withdrawn one) and the history of readable versions. Drafts and versions in review never appear.
 * `from`: the connection to read (default readDb(); the Library's cache entries read the primary).
 */
export async function findLibrarySheet({ vendorId, slug, number, from }: { vendorId: string; slug: string; number?: number; from?: Knex }) {
  const db = from ?? (await readDb());
  const sheet = await findSheet({ vendorId, slug, trx: db });
  if (!sheet) return null;
  const history: SheetVersion[] = (
    await versionQuery(vendorId, db).where("v.sheet_id", sheet.id).whereIn("v.state", READABLE_STATES).orderBy("v.number", "desc")
  ).map(rowToVersion);
  const current = history.find((v) => v.state === "published") ?? null;
  const version = number === undefined ? (current ?? history[0]) : history.find((v) => v.number === number);
  if (!version || !version.frontMatter) return null;
  const [cutter, material, machineClass] = await Promise.all([
    findCutterById({ vendorId, id: sheet.cutterId }),
    findMaterialById({ vendorId, id: sheet.materialId }),
    findMachineClassById({ vendorId, id: sheet.machineClassId }),
  ]);
  if (!cutter || !material || !machineClass) return null;
  return { sheet, version, frontMatter: version.frontMatter, current, history, cutter, material, machineClass };
}

export type LibrarySheet = NonNullable<Awaited<ReturnType<typeof findLibrarySheet>>>;
