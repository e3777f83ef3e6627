import "server-only";

import type { FamilyRules } from "@/content-schema/family";
import { diffParameters, type OperationDiff } from "@/lib/sheets/parameter-diff";

import { listCellSheets } from "./cell-sheets";
import { cellStatus, type CellStatus } from "./cell-status";
import { computeCell, eachCell, type ComputedCell } from "./compute-cells";
import { getFamily } from "./get-family";
import { getFamilyCatalogue } from "./get-family-catalogue";

export type PreviewCell = ComputedCell & {
  status: CellStatus;
  existing: { slug: string; number: number; state: string } | null;
  diff: OperationDiff[];
};

/** Most cells a preview computes at once; a larger family is previewed a page at a time. */
export const PREVIEW_PAGE = 1000;

/** Every cell of the family under `rules` (default: its newest rules), with the engine's warnings and the change against each existing sheet's current version. */
export async function previewFamily({
  vendorId,
  slug,
  rules,
  offset = 0,
  limit = PREVIEW_PAGE,
}: {
  vendorId: string;
  slug: string;
  rules: FamilyRules;
  offset?: number;
  limit?: number;
}) {
  const family = await getFamily({ vendorId, slug });
  const catalogue = await getFamilyCatalogue({ vendorId, family });
  const sheets = await listCellSheets({
    vendorId,
    cutterIds: catalogue.cutters.map((c) => c.id),
    materialIds: family.materialIds,
    machineClassIds: family.machineClassIds,
  });
  const cells: PreviewCell[] = [];
  let index = 0;
  for (const cell of eachCell(catalogue)) {
    if (index++ < offset) continue;
    if (cells.length >= limit) break;
    const computed = computeCell(cell, rules);
    const sheet = sheets.get(computed.key);
    const status = cellStatus(computed, sheet);
    const current = sheet?.published?.frontMatter;
    const diff = current
      ? diffParameters(current, { ...current, operations: computed.operations.map((op) => op.operation) }, cell.cutter)
      : [];
    cells.push({
      ...computed,
      status,
      existing: sheet ? { slug: sheet.slug, number: sheet.latest.number, state: sheet.latest.state } : null,
      diff,
    });
  }
  const total = catalogue.cutters.length * catalogue.materials.length * catalogue.machineClasses.length;
  return { family, catalogue, cells, total };
}

export function countStatuses(cells: { status: CellStatus }[]): Record<CellStatus, number> {
  const counts: Record<CellStatus, number> = { new: 0, changed: 0, unchanged: 0, warned: 0, busy: 0 };
  for (const c of cells) counts[c.status] += 1;
  return counts;
}
