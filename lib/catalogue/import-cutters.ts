import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

import { checkCutterCsv, formatCellError, type CutterCsvReport } from "./cutter-csv";
import type { ImportMode } from "./import-cutters-types";
import { insertCutter } from "./save-cutter";

export type { ImportMode } from "./import-cutters-types";

export type ImportResult = { imported: number; skipped: number; report: CutterCsvReport };

type Options = {
  vendorId: string;
  userId: string | null;
  csv: string;
  mode: ImportMode;
  onProgress?: (done: number, total: number) => void;
};

/**
 * Imports cutters from CSV in one transaction. "all-or-nothing" refuses the whole file when any row
 * is wrong; "valid-rows" imports the rows without errors and reports the others.
 */
export async function importCutters({ vendorId, userId, csv, mode, onProgress }: Options): Promise<ImportResult> {
  const existing = await db("cutters").where({ vendor_id: vendorId }).pluck("sku");
  const report = checkCutterCsv(csv, existing);
  if (report.fileErrors.length) throw new InvalidInput(report.fileErrors.join(" "), { csv: report.fileErrors });
  const bad = report.rows.filter((r) => r.errors.length > 0);
  if (mode === "all-or-nothing" && bad.length > 0) {
    const messages = bad.flatMap((r) => r.errors.map((e) => formatCellError(r.row, e)));
    throw new InvalidInput(`Nothing was imported: ${bad.length} row(s) have errors.`, { csv: messages });
  }
  const good = report.rows.filter((r) => r.fields);
  // Each insert queues its catalogue event in this transaction.
  await db.transaction(async (trx) => {
    for (const [index, row] of good.entries()) {
      await insertCutter({ vendorId, userId, fields: row.fields!, trx });
      onProgress?.(index + 1, good.length);
    }
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "cutter.import",
        objectType: "cutter",
        details: { imported: good.length, skipped: bad.length, mode },
      },
      trx,
    );
  });
  return { imported: good.length, skipped: bad.length, report };
}
