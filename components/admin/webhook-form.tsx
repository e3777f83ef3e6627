"use client";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { WEBHOOK_EVENT_TYPES, webhookEventLabels } from "@/content-schema/webhook-events";
import { webhookFormSchema } from "@/content-schema/webhook-form";
import type { FormAction } from "@/lib/actions/action-state";

export function WebhookForm({ vendor, createWebhookAction }: { vendor: string; createWebhookAction: FormAction }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(createWebhookAction, webhookFormSchema);
  const created = state.ok ? (state.data as { id: string; secret: string } | undefined) : undefined;
  return (
    <form
      action={formAction}
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4 rounded-lg border border-stone-200 bg-white p-4"
    >
      <input type="hidden" name="vendor" value={vendor} />
      <Field
        label="Address (https)"
        name="url"
        type="url"
        inputMode="url"
        autoComplete="off"
        placeholder="https://shop.example.com/swarfbook-events"
        errors={errors.url}
        defaultValue={state.ok ? "" : state.values?.url}
        key={created?.id ?? "url"}
      />
      <Field
        label="Note for your team (optional)"
        name="description"
        errors={errors.description}
        defaultValue={state.ok ? "" : state.values?.description}
        key={`${created?.id ?? "d"}-d`}
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-medium">Events</legend>
        {WEBHOOK_EVENT_TYPES.map((type) => (
          <label key={type} className="flex min-h-11 items-center gap-2 text-sm">
            <input type="checkbox" name="events" value={type} defaultChecked={type === "sheet.published"} className="size-5" />
            <span>
              <code>{type}</code>: {webhookEventLabels[type]}
            </span>
          </label>
        ))}
        {errors.events ? <p className="text-sm text-red-800">⚠ {errors.events.join(" ")}</p> : null}
      </fieldset>
      <div>
        <SubmitButton pendingText="Adding…">Add webhook</SubmitButton>
      </div>
      <FormMessage state={state} success={state.message} />
      {created ? (
        <div className="rounded border border-amber-300 bg-amber-50 p-3 text-sm" data-testid="webhook-secret">
          <p className="font-medium">Signing secret (shown once):</p>
          <p className="num mt-1 select-all break-all" data-secret={created.secret}>
            {created.secret}
          </p>
        </div>
      ) : null}
    </form>
  );
}
