"use server";

import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";

import { renderDraftPreview } from "@/components/drafting/draft-preview";
import { newSheetSchema, sheetSlugSchema, sourceSchema, submitDraftSchema, withdrawSchema } from "@/content-schema/sheet-workflow";
import type { ActionState } from "@/lib/actions/action-state";
import { vendorAction } from "@/lib/actions/vendor-action";
import { findCutterById, findMachineClassById, findMaterialById } from "@/lib/catalogue/find-catalogue-item";
import { NotFound } from "@/lib/errors/domain-errors";
import { approveDraft } from "@/lib/sheets/approve-draft";
import { checkDraftSource } from "@/lib/sheets/check-draft-source";
import { createSheet } from "@/lib/sheets/create-sheet";
import { getSheet } from "@/lib/sheets/find-sheet";
import { newSheetSource } from "@/lib/sheets/new-sheet-source";
import { publishDraft } from "@/lib/sheets/publish-draft";
import { returnToDraft } from "@/lib/sheets/return-to-draft";
import { DraftConflict, saveDraft } from "@/lib/sheets/save-draft";
import { startNewVersion } from "@/lib/sheets/start-new-version";
import { submitDraft } from "@/lib/sheets/submit-draft";
import { withdrawVersion } from "@/lib/sheets/withdraw-version";

const onSheet = z.object({ vendor: z.string(), slug: sheetSlugSchema });
const sheetPath = (vendor: string, slug: string, rest = "") => `/${vendor}/drafting/sheets/${slug}${rest}`;

export const createSheetAction = vendorAction(
  { permission: "sheets.author", schema: newSheetSchema.extend({ vendor: z.string() }) },
  async (input, { vendor, user }) => {
    const [cutter, material, machineClass] = await Promise.all([
      findCutterById({ vendorId: vendor.id, id: input.cutterId }),
      findMaterialById({ vendorId: vendor.id, id: input.materialId }),
      findMachineClassById({ vendorId: vendor.id, id: input.machineClassId }),
    ]);
    if (!cutter || !material || !machineClass) throw new NotFound();
    const source = newSheetSource({ cutter, material, machineClass });
    await createSheet({
      vendorId: vendor.id,
      userId: user.id,
      slug: input.slug,
      source,
      refs: { cutterId: cutter.id, materialId: material.id, machineClassId: machineClass.id },
    });
    redirect(sheetPath(vendor.slug, input.slug, "/edit"));
  },
);

export type SaveDraftResult = ActionState<{
  revision?: number;
  valid?: boolean;
  conflict?: { source: string; revision: number; updatedByName: string | null };
}>;

export const saveDraftAction = vendorAction(
  { permission: "sheets.author", schema: onSheet.extend({ source: sourceSchema, revision: z.coerce.number().int().min(0) }) },
  async (input, { vendor, user }): Promise<SaveDraftResult> => {
    try {
      const saved = await saveDraft({
        vendorId: vendor.id,
        userId: user.id,
        slug: input.slug,
        source: input.source,
        revision: input.revision,
      });
      return { ok: true, data: { revision: saved.revision, valid: saved.valid } };
    } catch (error) {
      if (!(error instanceof DraftConflict)) throw error;
      return {
        ok: false,
        message: error.message,
        data: { conflict: { source: error.current.source, revision: error.current.revision, updatedByName: error.current.updatedByName } },
      };
    }
  },
);

export const submitDraftAction = vendorAction(
  { permission: "sheets.author", schema: onSheet.extend(submitDraftSchema.shape) },
  async (input, { vendor, user }) => {
    await submitDraft({ vendorId: vendor.id, userId: user.id, slug: input.slug, changeNote: input.changeNote });
    redirect(sheetPath(vendor.slug, input.slug));
  },
);

export const returnToDraftAction = vendorAction({ permission: "sheets.author", schema: onSheet }, async (input, { vendor, user }) => {
  await returnToDraft({ vendorId: vendor.id, userId: user.id, slug: input.slug });
  redirect(sheetPath(vendor.slug, input.slug, "/edit"));
});

export const approveDraftAction = vendorAction({ permission: "sheets.review", schema: onSheet }, async (input, { vendor, user }) => {
  await approveDraft({ vendorId: vendor.id, userId: user.id, slug: input.slug });
  redirect(sheetPath(vendor.slug, input.slug));
});

export const publishDraftAction = vendorAction({ permission: "sheets.publish", schema: onSheet }, async (input, { vendor, user }) => {
  await publishDraft({ vendorId: vendor.id, userId: user.id, slug: input.slug });
  redirect(sheetPath(vendor.slug, input.slug));
});

export const withdrawAction = vendorAction(
  { permission: "sheets.publish", schema: onSheet.extend(withdrawSchema.shape) },
  async (input, { vendor, user }) => {
    await withdrawVersion({ vendorId: vendor.id, userId: user.id, slug: input.slug, reason: input.reason, number: input.version });
    redirect(sheetPath(vendor.slug, input.slug));
  },
);

export const newVersionAction = vendorAction({ permission: "sheets.author", schema: onSheet }, async (input, { vendor, user }) => {
  await startNewVersion({ vendorId: vendor.id, userId: user.id, slug: input.slug });
  redirect(sheetPath(vendor.slug, input.slug, "/edit"));
});

export const previewDraftAction = vendorAction(
  {
    permission: "sheets.author",
    schema: onSheet.extend({ source: sourceSchema, units: z.enum(["metric", "imperial"]).default("metric") }),
  },
  async (input, { vendor }) => {
    const sheet = await getSheet({ vendorId: vendor.id, slug: input.slug });
    const cutter = await findCutterById({ vendorId: vendor.id, id: sheet.cutterId });
    if (!cutter) throw new NotFound();
    const check = await checkDraftSource({ vendorId: vendor.id, source: input.source, expected: sheet });
    let preview: ReactNode = null;
    let renderError: string | null = null;
    try {
      preview = await renderDraftPreview({ check, source: input.source, cutter, units: input.units });
    } catch (error) {
      // The checks above report every problem with its line; anything left is ours, so it is logged, not shown.
      console.error("[preview]", error);
      renderError = "The preview could not be rendered. Fix the problems listed above, or save and try again.";
    }
    return { ok: true, data: { issues: check.issues, valid: check.ok, preview, renderError } };
  },
);
