"use client";

import { addMyCutterAction } from "@/app/[vendor]/(customer)/bench/actions";
import { ActionForm } from "@/components/drafting/action-form";
import { Field } from "@/components/forms/field";

/** Type a cutter's SKU (as printed on the box) to add it to my cutters. */
export function AddCutterForm({ vendorSlug }: { vendorSlug: string }) {
  return (
    <ActionForm action={addMyCutterAction} hidden={{ vendor: vendorSlug }} submitLabel="Add to my cutters" label="Add a cutter by its SKU">
      {(errors) => <Field label="Cutter SKU" name="sku" errors={errors.sku} autoComplete="off" spellCheck={false} hint="As printed on the box, or scan the box's QR code and add it from the cutter's page." />}
    </ActionForm>
  );
}
