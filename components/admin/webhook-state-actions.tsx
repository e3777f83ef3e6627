"use client";

import { useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

export function WebhookStateActions({
  vendor,
  webhookId,
  state,
  resumeWebhookAction,
  deleteWebhookAction,
}: {
  vendor: string;
  webhookId: string;
  state: "active" | "paused";
  resumeWebhookAction: FormAction;
  deleteWebhookAction: FormAction;
}) {
  const [resumeState, resume] = useActionState(resumeWebhookAction, initialActionState);
  const [deleteState, remove] = useActionState(deleteWebhookAction, initialActionState);
  return (
    <div className="flex flex-wrap items-center gap-3">
      {state === "paused" ? (
        <form action={resume}>
          <input type="hidden" name="vendor" value={vendor} />
          <input type="hidden" name="webhookId" value={webhookId} />
          <SubmitButton pendingText="Resuming…">Resume deliveries</SubmitButton>
        </form>
      ) : null}
      <form
        action={remove}
        onSubmit={(e) => {
          if (!window.confirm("Remove this webhook and its delivery log?")) e.preventDefault();
        }}
      >
        <input type="hidden" name="vendor" value={vendor} />
        <input type="hidden" name="webhookId" value={webhookId} />
        <SubmitButton variant="danger" pendingText="Removing…">
          Remove webhook
        </SubmitButton>
      </form>
      <div className="basis-full">
        <FormMessage state={resumeState.message ? resumeState : deleteState} success={resumeState.message ?? deleteState.message} />
      </div>
    </div>
  );
}
