import type { ReactNode } from "react";

/**
 * A GET form for a Field-results date range (and any extra fields): the choice lives in the URL, so a filtered
 * list can be bookmarked and shared. The server validates the search params; `error` says what was wrong.
 */
export function DateRangeForm({
  action,
  label,
  from,
  to,
  error,
  children,
}: {
  action: string;
  label: string;
  from?: string;
  to?: string;
  error?: string | null;
  children?: ReactNode;
}) {
  return (
    <form method="get" action={action} aria-label={label} className="mb-3 flex flex-wrap items-end gap-3 text-sm">
      <label className="flex flex-col">
        <span>From</span>
        <input type="date" name="from" defaultValue={from ?? ""} className="min-h-11 rounded border border-stone-300 bg-white px-2" />
      </label>
      <label className="flex flex-col">
        <span>To</span>
        <input type="date" name="to" defaultValue={to ?? ""} className="min-h-11 rounded border border-stone-300 bg-white px-2" />
      </label>
      {children}
      <button type="submit" className="min-h-11 rounded border border-stone-300 bg-white px-4 font-medium">
        Show
      </button>
      {error ? (
        <p role="alert" className="basis-full text-red-800">
          ⚠ {error}
        </p>
      ) : null}
    </form>
  );
}
