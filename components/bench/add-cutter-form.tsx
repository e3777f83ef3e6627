"use client";

import { useActionState } from "react";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

/** Type a cutter's SKU (as printed on the box) to add it to my cutters; says whether it was new. */
export function AddCutterForm({ vendorSlug, addMyCutterAction }: { vendorSlug: string; addMyCutterAction: FormAction }) {
  const [state, action] = useActionState(addMyCutterAction, initialActionState);
  return (
    <form action={action} aria-label="Add a cutter by its SKU" className="flex flex-col gap-2">
      <input type="hidden" name="vendor" value={vendorSlug} />
      <Field
        label="Cutter SKU"
        name="sku"
        errors={state.errors?.sku}
        autoComplete="off"
        spellCheck={false}
        hint="As printed on the box, or scan the box's QR code and add it from the cutter's page."
      />
      <div>
        <SubmitButton pendingText="Adding…">Add to my cutters</SubmitButton>
      </div>
      <FormMessage state={state} success={state.message} />
    </form>
  );
}
