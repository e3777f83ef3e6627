import { formatParameterChange, type OperationDiff } from "@/lib/sheets/parameter-diff";

/** A cell's changes against the current version, one line per changed parameter (metric, for staff). */
export function DiffSummary({ diff }: { diff: OperationDiff[] }) {
  type Line = { key: string; op: string; status: string; text: ReturnType<typeof formatParameterChange> | null };
  const lines = diff
    .filter((op) => op.status !== "unchanged")
    .flatMap((op): Line[] =>
      op.changes.length
        ? op.changes.map((c) => ({
            key: `${op.key}-${c.parameter}`,
            op: op.label,
            status: op.status,
            text: formatParameterChange(c, "metric"),
          }))
        : [{ key: op.key, op: op.label, status: op.status, text: null }],
    );
  if (!lines.length) return <span className="text-stone-600">—</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {lines.map((l) => (
        <li key={l.key} className="whitespace-nowrap">
          {l.op}:{" "}
          {l.text ? (
            <span className="num">
              {l.text.label.split(" ")[0]} {l.text.before} → {l.text.after}
            </span>
          ) : (
            l.status
          )}
        </li>
      ))}
    </ul>
  );
}
