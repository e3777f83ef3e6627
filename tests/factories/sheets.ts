import { approveDraft } from "@/lib/sheets/approve-draft";
import { createSheet } from "@/lib/sheets/create-sheet";
import { publishDraft } from "@/lib/sheets/publish-draft";
import { submitDraft } from "@/lib/sheets/submit-draft";

import { createCatalogue } from "./catalogue";
import { createVendorWithStaff, uniq } from "./foundation";
import { buildSheetSource, operationInput } from "./sheet-source";

/** A valid source for the catalogue of tests/factories/catalogue.ts, with the slot's feed given. */
export const sourceWithFeed = (vf = "1800 mm/min") => buildSheetSource({ frontMatter: { operations: [operationInput({ vf })] } });

/** A vendor with staff and catalogue, and one sheet whose first version is a draft by `engineer`. */
export async function createDraftingScenario(settings: Record<string, unknown> = {}) {
  const staff = await createVendorWithStaff({ settings });
  const catalogue = await createCatalogue(staff.vendor.id);
  const slug = uniq("sheet");
  const created = await createSheet({ vendorId: staff.vendor.id, userId: staff.engineer.user.id, slug, source: sourceWithFeed() });
  const as = (userId: string) => ({ vendorId: staff.vendor.id, userId, slug });
  return { ...staff, ...catalogue, slug, created, as };
}

/** Submits, approves (by engineer2) and publishes the open draft. */
export async function publishOpenDraft(
  s: Awaited<ReturnType<typeof createDraftingScenario>>,
  changeNote = "Tested on the reference router.",
) {
  await submitDraft({ ...s.as(s.engineer.user.id), changeNote });
  await approveDraft(s.as(s.engineer2.user.id));
  return publishDraft(s.as(s.engineer2.user.id));
}
