"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";

import { IdempotencyKeyField } from "@/components/forms/idempotency-key-field";
import {
  CHANGEABLE_PARAMS,
  changeableParamLabels,
  OUTCOME_RESULTS,
  OUTCOME_SYMPTOMS,
  outcomeResultLabels,
  outcomeSymptomLabels,
  type ChangeableParam,
  type OutcomeResult,
} from "@/content-schema/outcome-fields";
import { QUANTITIES, type QuantityKind } from "@/lib/machining";

type Props = { vendorSlug: string; setupId: string; units: string; current: Record<string, string> };
type Errors = Record<string, string[]>;

const paramKinds: Record<ChangeableParam, QuantityKind> = {
  rpm: "spindleSpeed",
  feedMmMin: "feedRate",
  axialDepthMm: "length",
  radialDepthMm: "length",
  plungeFeedMmMin: "feedRate",
};

/** Report how the cut went; posted as multipart so a photo can go with it. */
export function OutcomeForm({ vendorSlug, setupId, units, current }: Props) {
  const router = useRouter();
  // Nothing chosen at first: a preselected answer would be sent by people who never read the question.
  const [result, setResult] = useState<OutcomeResult | null>(null);
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    setPending(true);
    setMessage(null);
    try {
      const data = new FormData(form);
      // A resubmit after an error carries the same key, so the report is recorded once.
      const headers = { "Idempotency-Key": String(data.get("idempotencyKey")) };
      const res = await fetch(`/api/v1/vendors/${vendorSlug}/setups/${setupId}/outcomes`, { method: "POST", body: data, headers });
      const body = (await res.json().catch(() => ({}))) as { message?: string; fieldErrors?: Errors };
      if (!res.ok) {
        setErrors(body.fieldErrors ?? {});
        setMessage({ ok: false, text: body.message ?? "The report was not saved." });
        return;
      }
      setErrors({});
      form.reset();
      setResult(null);
      setMessage({ ok: true, text: "Thank you: the outcome is recorded against this setup's version." });
      router.refresh();
    } finally {
      setPending(false);
    }
  }

  const err = (key: string) =>
    errors[key]?.length ? (
      <p className="text-sm text-red-800">
        <span aria-hidden>⚠ </span>
        {errors[key].join(" ")}
      </p>
    ) : null;
  return (
    <form onSubmit={submit} className="space-y-4" aria-label="Report an outcome">
      <input type="hidden" name="units" value={units} />
      <IdempotencyKeyField renewOn={message?.ok ? message : null} />
      <fieldset>
        <legend className="text-sm font-semibold">How did the cut go?</legend>
        {err("result")}
        <div className="mt-2 flex flex-wrap gap-2">
          {OUTCOME_RESULTS.map((r) => (
            <label
              key={r}
              className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded border border-stone-300 bg-white px-3 has-[:checked]:border-stone-900 has-[:checked]:bg-stone-100"
            >
              <input type="radio" name="result" value={r} checked={result === r} onChange={() => setResult(r)} />
              {outcomeResultLabels[r]}
            </label>
          ))}
        </div>
      </fieldset>
      {result === "failed" ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="outcome-symptom" className="text-sm font-medium">
            What went wrong?
          </label>
          <select
            id="outcome-symptom"
            name="symptom"
            defaultValue=""
            className="min-h-11 max-w-sm rounded border border-stone-300 bg-white px-3"
          >
            <option value="" disabled>
              Pick one
            </option>
            {OUTCOME_SYMPTOMS.map((s) => (
              <option key={s} value={s}>
                {outcomeSymptomLabels[s]}
              </option>
            ))}
          </select>
          {err("symptom")}
        </div>
      ) : null}
      {result === "worked_after_changes" ? (
        <fieldset>
          <legend className="text-sm font-semibold">Which numbers did you change? (fill in only those)</legend>
          <div className="mt-2 grid gap-2">
            {CHANGEABLE_PARAMS.filter((p) => current[p]).map((p) => {
              const unit = QUANTITIES[paramKinds[p]][units === "imperial" ? "imperial" : "metric"];
              return (
                <div key={p} className="grid items-end gap-2 sm:grid-cols-[12rem_1fr_1fr]" data-change={p}>
                  <span className="text-sm" aria-hidden>
                    {changeableParamLabels[p]}
                  </span>
                  <label className="flex flex-col text-xs text-stone-600">
                    <span>from ({unit})</span>
                    <input
                      name={`from_${p}`}
                      defaultValue={current[p]}
                      aria-label={`${changeableParamLabels[p]}: from, in ${unit}`}
                      className="num min-h-11 rounded border border-stone-300 bg-white px-3 text-base text-stone-900"
                    />
                  </label>
                  <label className="flex flex-col text-xs text-stone-600">
                    <span>to ({unit})</span>
                    <input
                      name={`to_${p}`}
                      aria-label={`${changeableParamLabels[p]}: changed to, in ${unit}`}
                      className="num min-h-11 rounded border border-stone-300 bg-white px-3 text-base text-stone-900"
                    />
                  </label>
                </div>
              );
            })}
          </div>
          {err("changes")}
        </fieldset>
      ) : null}
      <div className="flex flex-col gap-1">
        <label htmlFor="outcome-notes" className="text-sm font-medium">
          Notes (optional)
        </label>
        <textarea
          id="outcome-notes"
          name="notes"
          rows={3}
          maxLength={2000}
          className="rounded border border-stone-300 bg-white px-3 py-2"
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="outcome-photo" className="text-sm font-medium">
          Photo of the part or cutter (optional; PNG, JPEG or WebP, up to 10 MB)
        </label>
        <input id="outcome-photo" name="photo" type="file" accept="image/png,image/jpeg,image/webp" className="min-h-11" />
        {err("photo")}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="submit"
          disabled={pending}
          className="min-h-11 rounded bg-accent px-4 font-medium text-accent-ink disabled:opacity-60"
        >
          {pending ? "Sending…" : "Report outcome"}
        </button>
        <div aria-live="polite" className="text-sm">
          {message ? (
            <p className={message.ok ? "text-green-800" : "text-red-800"}>
              <span aria-hidden>{message.ok ? "✓ " : "⚠ "}</span>
              {message.text}
            </p>
          ) : null}
        </div>
      </div>
    </form>
  );
}
