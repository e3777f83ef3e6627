"use client";

import { useActionState } from "react";

import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

export function RedeliverButton({
  vendor,
  webhookId,
  deliveryId,
  redeliverAction,
}: {
  vendor: string;
  webhookId: string;
  deliveryId: string;
  redeliverAction: FormAction;
}) {
  const [state, action] = useActionState(redeliverAction, initialActionState);
  return (
    <form action={action} className="flex flex-col items-start gap-1">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="webhookId" value={webhookId} />
      <input type="hidden" name="deliveryId" value={deliveryId} />
      <SubmitButton variant="quiet" pendingText="Sending…">
        Send again
      </SubmitButton>
      {state.message ? (
        <p role={state.ok ? "status" : "alert"} className={`text-xs ${state.ok ? "text-green-800" : "text-red-800"}`}>
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
