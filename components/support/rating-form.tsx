"use client";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { ticketRatingSchema } from "@/content-schema/ticket-update";
import type { FormAction } from "@/lib/actions/action-state";

const LABELS = ["", "1 – poor", "2", "3", "4", "5 – excellent"];

export function RatingForm({
  vendor,
  ticketId,
  current,
  rateTicketAction,
}: {
  vendor: string;
  ticketId: string;
  current: number | null;
  rateTicketAction: FormAction;
}) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(rateTicketAction, ticketRatingSchema);
  return (
    <form
      action={formAction}
      onSubmit={onSubmit}
      className="space-y-3 rounded-lg border border-stone-300 bg-white p-4"
      aria-label="Rate this ticket"
    >
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="ticketId" value={ticketId} />
      <fieldset>
        <legend className="font-medium">How well was your question answered?</legend>
        <div className="mt-2 flex flex-wrap gap-2">
          {[1, 2, 3, 4, 5].map((n) => (
            <label key={n} className="flex min-h-11 items-center gap-2 rounded border border-stone-300 px-3">
              <input type="radio" name="satisfaction" value={n} defaultChecked={current === n} /> <span className="num">{LABELS[n]}</span>
            </label>
          ))}
        </div>
        {errors.satisfaction ? (
          <p className="text-sm text-red-800">
            <span aria-hidden>⚠ </span>
            {errors.satisfaction.join(" ")}
          </p>
        ) : null}
      </fieldset>
      <label htmlFor="f-comment" className="text-sm font-medium">
        Comment (optional)
      </label>
      <textarea id="f-comment" name="comment" rows={2} className="w-full rounded border border-stone-300 bg-white px-3 py-2" />
      <FormMessage state={state} success={state.message} />
      <SubmitButton>Send rating</SubmitButton>
    </form>
  );
}
