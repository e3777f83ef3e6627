"use client";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { createVendorSchema } from "@/content-schema/vendor-create";
import type { FormAction } from "@/lib/actions/action-state";

export function CreateVendorForm({ createVendorAction }: { createVendorAction: FormAction }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(createVendorAction, createVendorSchema);
  const v = state.ok ? {} : (state.values ?? {});
  return (
    <form
      action={formAction}
      onSubmit={onSubmit}
      noValidate
      className="grid gap-4 rounded-lg border border-stone-200 bg-white p-5 sm:grid-cols-2"
      key={state.ok ? state.message : "form"}
    >
      <Field label="Name" name="name" errors={errors.name} defaultValue={v.name} />
      <Field
        label="Address (slug)"
        name="slug"
        errors={errors.slug}
        defaultValue={v.slug}
        hint="Lower-case letters, digits, dashes: swarfbook/<slug>"
      />
      <Field
        label="Accent colour"
        name="accentColor"
        errors={errors.accentColor}
        defaultValue={v.accentColor ?? "#2f5d8a"}
        hint="Hex, like #2f5d8a"
      />
      <Field label="First admin's e-mail" name="adminEmail" type="email" errors={errors.adminEmail} defaultValue={v.adminEmail} />
      <div className="flex items-center gap-4 sm:col-span-2">
        <SubmitButton pendingText="Creating…">Create workspace</SubmitButton>
        <FormMessage state={state} success={state.message} />
      </div>
    </form>
  );
}
