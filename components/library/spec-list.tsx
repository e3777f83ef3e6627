import type { ReactNode } from "react";

/** A data-sheet block: term on the left, value (with its unit) on the right. */
export function SpecList({ rows }: { rows: [term: ReactNode, value: ReactNode][] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {rows.map(([term, value], i) => (
        <div key={i} className="contents">
          <dt className="text-stone-600">{term}</dt>
          <dd className="font-mono tabular-nums text-stone-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

export function SpecCard({ title, children, id }: { title: ReactNode; children: ReactNode; id?: string }) {
  return (
    <section id={id} className="break-inside-avoid rounded-md border border-stone-300 bg-white p-4 print:border-stone-800">
      <h2 className="mb-2 text-xs font-semibold uppercase tracking-wider text-stone-600 print:text-black">{title}</h2>
      {children}
    </section>
  );
}
