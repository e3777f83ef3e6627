"use client";

import { useEffect, useRef, useState } from "react";
import { z } from "zod";

import { FormMessage } from "@/components/forms/form-message";
import { IdempotencyKeyField } from "@/components/forms/idempotency-key-field";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import type { FormAction } from "@/lib/actions/action-state";

import { UploadField } from "./upload-field";

const schema = z.object({ body: z.string().trim().min(1, "Write a reply.") });

export function CustomerReplyForm({
  vendor,
  ticketId,
  customerReplyAction,
}: {
  vendor: string;
  ticketId: string;
  customerReplyAction: FormAction;
}) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(customerReplyAction, schema);
  const form = useRef<HTMLFormElement>(null);
  const [seen, setSeen] = useState(state);
  const [sent, setSent] = useState(0);
  if (state !== seen) {
    setSeen(state);
    if (state.ok) setSent((n) => n + 1);
  }
  useEffect(() => {
    if (sent) form.current?.reset();
  }, [sent]);
  return (
    <form ref={form} action={formAction} onSubmit={onSubmit} className="space-y-3" aria-label="Reply">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="ticketId" value={ticketId} />
      <IdempotencyKeyField renewOn={state.ok ? state : null} />
      <label htmlFor="f-reply" className="text-sm font-medium">
        Your reply
      </label>
      <textarea id="f-reply" name="body" rows={4} className="w-full rounded border border-stone-300 bg-white px-3 py-2" />
      {errors.body ? (
        <p className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors.body.join(" ")}
        </p>
      ) : null}
      <UploadField key={sent} vendor={vendor} label="Add photos or files" />
      <FormMessage state={state} success={state.message} />
      <SubmitButton pendingText="Sending…">Send reply</SubmitButton>
    </form>
  );
}
