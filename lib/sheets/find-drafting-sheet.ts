import "server-only";

import { findCutterById, findMachineClassById, findMaterialById } from "@/lib/catalogue/find-catalogue-item";

import { findSheet, listVersions } from "./find-sheet";

/** A sheet with its catalogue entries and every version (drafts included), newest first. */
export async function findDraftingSheet({ vendorId, slug }: { vendorId: string; slug: string }) {
  const sheet = await findSheet({ vendorId, slug });
  if (!sheet) return null;
  const [cutter, material, machineClass, versions] = await Promise.all([
    findCutterById({ vendorId, id: sheet.cutterId }),
    findMaterialById({ vendorId, id: sheet.materialId }),
    findMachineClassById({ vendorId, id: sheet.machineClassId }),
    listVersions({ vendorId, sheetId: sheet.id }),
  ]);
  if (!cutter || !material || !machineClass) return null;
  const openDraft = versions.find((v) => v.state === "draft" || v.state === "in_review") ?? null;
  const published = versions.find((v) => v.state === "published") ?? null;
  return { sheet, cutter, material, machineClass, versions, openDraft, published };
}

export type DraftingSheet = NonNullable<Awaited<ReturnType<typeof findDraftingSheet>>>;
