import type { SelectHTMLAttributes } from "react";

type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  name: string;
  options: { id: string; name: string }[];
  errors?: string[];
  empty?: string;
};

export function SelectField({ label, name, options, errors, empty = "—", id, ...rest }: Props) {
  const fieldId = id ?? `f-${name}`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="text-sm font-medium">
        {label}
      </label>
      <select
        id={fieldId}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        className="min-h-11 rounded border border-stone-300 bg-white px-3 py-2"
        {...rest}
      >
        <option value="">{empty}</option>
        {options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </select>
      {errors?.length ? (
        <p className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
