"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useForm, type FieldValues, type Resolver } from "react-hook-form";
import type { z } from "zod";

import { initialActionState, type ActionState } from "@/lib/actions/action-state";

export type FieldSpec = {
  name: string;
  label: string;
  type?: "text" | "number" | "textarea" | "select";
  options?: readonly (readonly [value: string, label: string])[];
  hint?: string;
  step?: string;
};

type Props = {
  schema: z.ZodType;
  fields: FieldSpec[];
  action: (state: ActionState, input: Record<string, unknown>) => Promise<ActionState>;
  hidden: Record<string, string>;
  defaultValues: Record<string, unknown>;
  submitLabel: string;
  /** Where to go after saving; `{slug}`/`{sku}` are replaced from the saved values. */
  doneHref: (values: Record<string, unknown>) => string;
};

const input = "min-h-11 rounded border border-stone-300 bg-white px-3 py-2 aria-[invalid=true]:border-red-700";

/** A catalogue form: the zod schema checks in the browser, the same schema again in the server action. */
export function CatalogueForm({ schema, fields, action, hidden, defaultValues, submitLabel, doneHref }: Props) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [pending, start] = useTransition();
  const form = useForm<FieldValues>({
    resolver: zodResolver(schema as z.ZodType<FieldValues, FieldValues>) as Resolver<FieldValues>,
    defaultValues,
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((values) =>
    start(async () => {
      setMessage(null);
      const raw = form.getValues();
      const result = await action(initialActionState, { ...raw, ...hidden });
      if (result.ok) {
        router.push(doneHref(values));
        router.refresh();
        return;
      }
      setMessage(result.message ?? "Not saved.");
      for (const [name, messages] of Object.entries(result.errors ?? {})) form.setError(name, { message: messages.join(" ") });
    }),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="grid max-w-3xl gap-4 sm:grid-cols-2">
      {fields.map((f) => {
        const error = errors[f.name]?.message;
        const id = `f-${f.name}`;
        const common = {
          id,
          "aria-invalid": error ? true : undefined,
          "aria-describedby": error ? `${id}-error` : f.hint ? `${id}-hint` : undefined,
          ...form.register(f.name),
        };
        return (
          <div key={f.name} className={`flex flex-col gap-1 ${f.type === "textarea" ? "sm:col-span-2" : ""}`}>
            <label htmlFor={id} className="text-sm font-medium">
              {f.label}
            </label>
            {f.type === "textarea" ? (
              <textarea rows={4} className={input} {...common} />
            ) : f.type === "select" ? (
              <select className={input} {...common}>
                {f.options?.map(([value, label]) => (
                  <option key={value} value={value}>
                    {label}
                  </option>
                ))}
              </select>
            ) : (
              <input
                type="text"
                inputMode={f.type === "number" ? "decimal" : undefined}
                className={`${input} ${f.type === "number" ? "font-mono tabular-nums" : ""}`}
                {...common}
              />
            )}
            {f.hint ? (
              <p id={`${id}-hint`} className="text-xs text-stone-600">
                {f.hint}
              </p>
            ) : null}
            {error ? (
              <p id={`${id}-error`} className="text-sm text-red-800">
                <span aria-hidden>⚠ </span>
                {String(error)}
              </p>
            ) : null}
          </div>
        );
      })}
      <div className="flex items-center gap-3 sm:col-span-2">
        <button
          type="submit"
          disabled={pending}
          className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink disabled:opacity-60"
        >
          {pending ? "Saving…" : submitLabel}
        </button>
        {message ? (
          <p role="alert" className="text-sm text-red-800">
            ⚠ {message}
          </p>
        ) : null}
      </div>
    </form>
  );
}
