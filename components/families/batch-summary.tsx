const LABELS: [key: string, label: string][] = [
  ["created", "New sheets"],
  ["new-version", "New versions"],
  ["unchanged", "No change"],
  ["blocked", "Blocked by a warning"],
  ["busy", "Left alone (open draft)"],
  ["excluded", "Left out by the reviewer"],
];

/** The batch in numbers, each a link to its sheets. */
export function BatchSummary({ counts, base }: { counts: Record<string, number>; base: string }) {
  return (
    <dl className="flex flex-wrap gap-3 text-sm" data-testid="batch-counts">
      {LABELS.map(([key, label]) => (
        <div key={key} data-count={key} className="rounded border border-stone-300 bg-white px-3 py-2">
          <dt>
            {key === "excluded" ? (
              <span className="text-stone-600">{label}</span>
            ) : (
              <a className="text-stone-700 underline" href={`${base}?outcome=${key}`}>
                {label}
              </a>
            )}
          </dt>
          <dd className="num text-lg font-semibold">{counts[key] ?? 0}</dd>
        </div>
      ))}
    </dl>
  );
}
