import { changeableParamLabels, type ChangeableParam } from "@/content-schema/outcome-fields";
import type { Outcome } from "@/lib/bench/outcomes";
import { formatQuantity, type QuantityKind, type UnitSystem } from "@/lib/machining";
import { formatDateTime } from "@/lib/ui/dates";

import { OutcomeBadge } from "./outcome-badge";

const KIND: Record<ChangeableParam, QuantityKind> = {
  rpm: "spindleSpeed",
  feedMmMin: "feedRate",
  axialDepthMm: "length",
  radialDepthMm: "length",
  plungeFeedMmMin: "feedRate",
};

/** How the cuts went, newest first, each with its version and what was changed. */
export function OutcomeHistory({
  outcomes,
  units,
  versionNumbers,
  photoHref,
}: {
  outcomes: Outcome[];
  units: UnitSystem;
  versionNumbers: Record<string, number>;
  photoHref: (id: string) => string;
}) {
  if (!outcomes.length)
    return (
      <p className="text-sm text-stone-600">No outcome reported yet. Tell the engineers how the cut went: it improves the next version.</p>
    );
  return (
    <ol className="space-y-3" aria-label="Outcome history">
      {outcomes.map((o) => (
        <li key={o.id} data-outcome={o.result} className="rounded border border-stone-200 bg-white p-3 text-sm">
          <div className="flex flex-wrap items-center gap-2">
            <OutcomeBadge result={o.result} symptom={o.symptom} />
            <span className="num text-xs text-stone-600">
              v{versionNumbers[o.sheetVersionId] ?? "?"} · {formatDateTime(o.createdAt)}
            </span>
          </div>
          {Object.entries(o.changes).length ? (
            <ul className="mt-2 list-disc pl-5">
              {Object.entries(o.changes).map(([param, c]) => (
                <li key={param} className="num">
                  {changeableParamLabels[param as ChangeableParam]}: {formatQuantity(c!.from, KIND[param as ChangeableParam], units)} →{" "}
                  {formatQuantity(c!.to, KIND[param as ChangeableParam], units)}
                </li>
              ))}
            </ul>
          ) : null}
          {o.notes ? <p className="mt-2 whitespace-pre-wrap text-stone-700">{o.notes}</p> : null}
          {o.hasPhoto ? (
            <a href={photoHref(o.id)} className="mt-2 inline-flex min-h-11 items-center underline">
              View the photo
            </a>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
