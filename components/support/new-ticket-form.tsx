"use client";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { createTicketSchema } from "@/content-schema/ticket-create";
import type { FormAction } from "@/lib/actions/action-state";

import { SelectField } from "./select-field";
import { UploadField } from "./upload-field";

type Option = { id: string; name: string };
type Props = {
  createTicketAction: FormAction;
  vendor: string;
  idempotencyKey: string;
  materials: Option[];
  machines: Option[];
  sheetVersion: { id: string; title: string; number: number; materialId: string } | null;
  machineId?: string;
};

export function NewTicketForm({ createTicketAction, vendor, idempotencyKey, materials, machines, sheetVersion, machineId }: Props) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(createTicketAction, createTicketSchema);
  return (
    <form action={formAction} onSubmit={onSubmit} className="max-w-2xl space-y-4" aria-label="New ticket">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="idempotencyKey" value={idempotencyKey} />
      {sheetVersion ? (
        <p className="rounded border border-stone-300 bg-white p-3 text-sm">
          <input type="hidden" name="sheetVersionId" value={sheetVersion.id} />
          About the sheet <strong>{sheetVersion.title}</strong> <span className="num">v{sheetVersion.number}</span>
        </p>
      ) : null}
      <Field label="Subject" name="subject" required maxLength={200} defaultValue={state.values?.subject} errors={errors.subject} />
      <div className="flex flex-col gap-1">
        <label htmlFor="f-body" className="text-sm font-medium">
          What happened?
        </label>
        <textarea
          id="f-body"
          name="body"
          required
          rows={6}
          defaultValue={state.values?.body}
          className="rounded border border-stone-300 bg-white px-3 py-2"
          aria-describedby="f-body-hint"
        />
        <p id="f-body-hint" className="text-xs text-stone-600">
          The cut, the numbers you ran, what you saw and heard. Markdown lists and `code` work.
        </p>
        {errors.body ? (
          <p className="text-sm text-red-800">
            <span aria-hidden>⚠ </span>
            {errors.body.join(" ")}
          </p>
        ) : null}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Material"
          name="materialId"
          options={materials}
          defaultValue={state.values?.materialId ?? sheetVersion?.materialId ?? ""}
          errors={errors.materialId}
          empty="Not sure / other"
        />
        <SelectField
          label="Machine"
          name="machineId"
          options={machines}
          defaultValue={state.values?.machineId ?? machineId ?? ""}
          errors={errors.machineId}
          empty={machines.length ? "Not on a saved machine" : "No machines saved on your Bench"}
        />
      </div>
      <UploadField vendor={vendor} label="Photos and files" />
      <FormMessage state={state} />
      <SubmitButton pendingText="Sending…">Send to support</SubmitButton>
    </form>
  );
}
