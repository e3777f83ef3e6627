"use server";

import { redirect } from "next/navigation";
import { z } from "zod";

import { catalogueSlugSchema } from "@/content-schema/catalogue-fields";
import { batchExcludeSchema, familyFormSchema, familyRulesTextSchema } from "@/content-schema/family";
import { vendorAction } from "@/lib/actions/vendor-action";
import { approveBatch } from "@/lib/families/approve-batch";
import { excludeBatchItem } from "@/lib/families/exclude-batch-item";
import { publishBatch } from "@/lib/families/publish-batch";
import { createFamily, saveFamilyRules } from "@/lib/families/save-family";
import { startGeneration } from "@/lib/families/start-generation";

const onFamily = z.object({ vendor: z.string(), family: catalogueSlugSchema });
const onBatch = onFamily.extend({ batch: z.coerce.number().int().positive() });
const familyPath = (vendor: string, family: string, rest = "") => `/${vendor}/drafting/families/${family}${rest}`;

export const createFamilyAction = vendorAction(
  { permission: "sheets.author", schema: z.intersection(z.object({ vendor: z.string() }), familyFormSchema) },
  async (input, { vendor, user }) => {
    const { rules, ...definition } = input;
    await createFamily({ vendorId: vendor.id, userId: user.id, definition, rules });
    redirect(familyPath(vendor.slug, definition.slug));
  },
);

export const saveRulesAction = vendorAction(
  {
    permission: "sheets.author",
    schema: onFamily.extend({ rules: familyRulesTextSchema, note: z.string().trim().min(3, "Say what the new rules change.").max(500) }),
  },
  async (input, { vendor, user }) => {
    const saved = await saveFamilyRules({ vendorId: vendor.id, userId: user.id, slug: input.family, rules: input.rules, note: input.note });
    redirect(familyPath(vendor.slug, input.family, `?saved=${saved.number}`));
  },
);

export const generateAction = vendorAction({ permission: "sheets.author", schema: onFamily }, async (input, { vendor, user }) => {
  const batch = await startGeneration({ vendorId: vendor.id, userId: user.id, slug: input.family });
  redirect(familyPath(vendor.slug, input.family, `/batches/${batch.number}`));
});

export const excludeItemAction = vendorAction(
  { permission: "sheets.review", schema: onBatch.extend(batchExcludeSchema.shape) },
  async (input, { vendor, user }) => {
    await excludeBatchItem({
      vendorId: vendor.id,
      userId: user.id,
      slug: input.family,
      number: input.batch,
      itemId: input.itemId,
      reason: input.reason,
    });
    redirect(familyPath(vendor.slug, input.family, `/batches/${input.batch}`));
  },
);

export const approveBatchAction = vendorAction({ permission: "sheets.review", schema: onBatch }, async (input, { vendor, user }) => {
  await approveBatch({ vendorId: vendor.id, userId: user.id, slug: input.family, number: input.batch });
  redirect(familyPath(vendor.slug, input.family, `/batches/${input.batch}`));
});

export const publishBatchAction = vendorAction({ permission: "sheets.publish", schema: onBatch }, async (input, { vendor, user }) => {
  await publishBatch({ vendorId: vendor.id, userId: user.id, slug: input.family, number: input.batch });
  redirect(familyPath(vendor.slug, input.family, `/batches/${input.batch}`));
});
