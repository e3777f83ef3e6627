"use client";

type Props = {
  id: string;
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  hint?: string;
  placeholder?: string;
  inputMode?: "decimal" | "numeric" | "text";
};

/** A labelled text input with its message; large enough to hit with a gloved finger. */
export function TextInput({ id, label, value, onChange, error, hint, placeholder, inputMode = "text" }: Props) {
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <input
        id={id}
        value={value}
        placeholder={placeholder}
        inputMode={inputMode}
        autoComplete="off"
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="num min-h-11 rounded border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-red-700"
      />
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-stone-600">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {error}
        </p>
      ) : null}
    </div>
  );
}
