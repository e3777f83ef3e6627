import type { InputHTMLAttributes } from "react";

type Props = InputHTMLAttributes<HTMLInputElement> & { label: string; name: string; errors?: string[]; hint?: string };

export function Field({ label, name, errors, hint, id, ...input }: Props) {
  const fieldId = id ?? `f-${name}`;
  const describedBy = [errors?.length ? `${fieldId}-error` : null, hint ? `${fieldId}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="text-sm font-medium">
        {label}
      </label>
      <input
        id={fieldId}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy}
        className="min-h-11 rounded border border-stone-300 bg-white px-3 py-2 aria-[invalid=true]:border-red-700"
        {...input}
      />
      {hint ? (
        <p id={`${fieldId}-hint`} className="text-xs text-stone-600">
          {hint}
        </p>
      ) : null}
      {errors?.length ? (
        <p id={`${fieldId}-error`} className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
