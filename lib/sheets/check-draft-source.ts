import "server-only";

import type { Knex } from "knex";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";
import { hasErrors, type SheetIssue } from "@/lib/mdx/sheet-issue";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";

export type Refs = { cutterId: string; materialId: string; machineClassId: string };
export type DraftCheck = { ok: boolean; frontMatter: SheetFrontMatter | null; issues: SheetIssue[]; refs: Refs | null };

const lineOfKey = (source: string, key: string) => {
  const index = source.split(/\r?\n/).findIndex((line) => line.startsWith(`${key}:`));
  return index === -1 ? 1 : index + 1;
};

/**
 * Validates a sheet source and checks that its front matter names catalogue entries of this vendor
 * (and, for an existing sheet, the sheet's own cutter, material and machine class).
 */
export async function checkDraftSource({
  vendorId,
  source,
  expected,
  trx = db,
}: {
  vendorId: string;
  source: string;
  expected?: Refs;
  trx?: Knex;
}): Promise<DraftCheck> {
  const checked = validateSheetSource(source);
  const fm = checked.frontMatter ?? null;
  if (!fm) return { ok: false, frontMatter: null, issues: checked.issues, refs: null };
  const issues = [...checked.issues];
  // One after the other: inside a transaction the queries share one connection.
  const cutter = await trx("cutters").where({ vendor_id: vendorId }).whereRaw("lower(sku) = lower(?)", [fm.cutter]).first("id");
  const material = await trx("materials").where({ vendor_id: vendorId, slug: fm.material }).first("id");
  const machineClass = await trx("machine_classes").where({ vendor_id: vendorId, slug: fm.machineClass }).first("id");
  const refCheck = (key: string, found: { id: string } | undefined, want: string | undefined, what: string, value: string) => {
    if (!found)
      issues.push({ line: lineOfKey(source, key), path: key, severity: "error", message: `No ${what} “${value}” in the catalogue.` });
    else if (want && found.id !== want)
      issues.push({
        line: lineOfKey(source, key),
        path: key,
        severity: "error",
        message: `This sheet is for another ${what}; “${value}” cannot change it. Start a new sheet instead.`,
      });
  };
  refCheck("cutter", cutter, expected?.cutterId, "cutter", fm.cutter);
  refCheck("material", material, expected?.materialId, "material", fm.material);
  refCheck("machineClass", machineClass, expected?.machineClassId, "machine class", fm.machineClass);
  issues.sort((a, b) => a.line - b.line);
  const refs =
    cutter && material && machineClass ? { cutterId: cutter.id, materialId: material.id, machineClassId: machineClass.id } : null;
  return { ok: checked.ok && !hasErrors(issues), frontMatter: fm, issues, refs };
}
