import { formatQuantity, RULES, type AdaptStep, type UnitSystem } from "@/lib/machining";

const title = (rule: string) => RULES.find((r) => r.id === rule)?.title ?? rule;

/** Every rule that changed a number: before → after, why, and where the rule comes from. */
export function StepsTrail({ steps, units, emptyText }: { steps: AdaptStep[]; units: UnitSystem; emptyText?: string }) {
  if (!steps.length)
    return (
      <p className="mt-2 text-sm text-stone-600">{emptyText ?? "No rule changed a number: the sheet runs as written on this machine."}</p>
    );
  return (
    <ol className="mt-2 space-y-3" aria-label="Steps">
      {steps.map((s, i) => (
        <li key={`${s.rule}-${s.field}-${i}`} data-rule={s.rule} className="rounded border border-stone-200 bg-stone-50 p-3 text-sm">
          <p className="font-medium">
            {i + 1}. {title(s.rule)}:{" "}
            <span className="num">
              {formatQuantity(s.before, s.quantity, units)} → {formatQuantity(s.after, s.quantity, units)}
            </span>
          </p>
          <p className="mt-1 text-stone-700">{s.why}</p>
          <p className="mt-1 text-xs text-stone-500">Source: {s.source}</p>
        </li>
      ))}
    </ol>
  );
}
