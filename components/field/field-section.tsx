import type { ReactNode } from "react";

/** One list of Field results: heading, what it means, its CSV export, then the list. */
export function FieldSection({
  id,
  title,
  lead,
  csvHref,
  children,
}: {
  id: string;
  title: string;
  lead: ReactNode;
  csvHref?: string;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={`${id}-heading`} className="mt-10">
      <div className="mb-2 flex flex-wrap items-end justify-between gap-2">
        <h2 id={`${id}-heading`} className="text-lg font-semibold">
          {title}
        </h2>
        {csvHref ? (
          <a href={csvHref} className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3 text-sm" download>
            Export CSV<span className="sr-only"> of {title}</span>
          </a>
        ) : null}
      </div>
      <p className="mb-3 max-w-4xl text-sm text-stone-600">{lead}</p>
      {children}
    </section>
  );
}
