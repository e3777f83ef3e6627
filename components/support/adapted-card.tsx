import type { TicketCard } from "@/content-schema/ticket-card";
import { formatQuantity, QUANTITY_KINDS, type QuantityKind } from "@/lib/machining";
import { formatDateTime } from "@/lib/ui/dates";

// Cards saved before the sheet's fz, vc and plunge feed were stored say so instead of showing a dash.
const sheetValue = (value: number | null | undefined, kind: QuantityKind, units: "metric" | "imperial") =>
  value === undefined ? "not stored" : value === null ? "not on the sheet" : formatQuantity(value, kind, units);

const kindOf = (q: string): QuantityKind => ((QUANTITY_KINDS as string[]).includes(q) ? (q as QuantityKind) : "length");

/** A sheet version adapted to the customer's machine, as stored with the reply: numbers, rules applied, cautions. */
export function AdaptedCard({ card, vendorSlug }: { card: TicketCard; vendorSlug: string }) {
  const u = card.machine.units;
  return (
    <section
      aria-label={`Adapted sheet: ${card.title}`}
      data-adapted-card
      className="mt-3 rounded-lg border border-stone-300 bg-stone-50 p-4"
    >
      <header className="mb-2">
        <p className="text-xs tracking-wide text-stone-600 uppercase">Sheet adapted to {card.machine.name}</p>
        <a href={`/${vendorSlug}/library/${card.sheetSlug}/v/${card.versionNumber}`} className="font-semibold underline underline-offset-2">
          {card.title} <span className="num">v{card.versionNumber}</span>
        </a>
      </header>
      {card.operations.map((op, i) => (
        <div key={i} className="mt-3">
          <h4 className="font-medium">{op.label}</h4>
          {op.adapted ? (
            <table className="mt-1 w-full text-sm">
              <thead className="text-left text-stone-600">
                <tr>
                  <th className="pr-3 font-normal">Quantity</th>
                  <th className="pr-3 font-normal">Sheet</th>
                  <th className="font-normal">Your machine</th>
                </tr>
              </thead>
              <tbody className="num">
                <tr>
                  <td className="pr-3">n</td>
                  <td className="pr-3">{formatQuantity(op.reference.rpm, "spindleSpeed", u)}</td>
                  <td data-field="rpm">{formatQuantity(op.adapted.rpm, "spindleSpeed", u)}</td>
                </tr>
                <tr>
                  <td className="pr-3">vf</td>
                  <td className="pr-3">{formatQuantity(op.reference.feedMmMin, "feedRate", u)}</td>
                  <td data-field="vf">{formatQuantity(op.adapted.feedMmMin, "feedRate", u)}</td>
                </tr>
                <tr>
                  <td className="pr-3">fz</td>
                  <td className="pr-3">{sheetValue(op.reference.chipLoadMm, "chipLoad", u)}</td>
                  <td>{formatQuantity(op.adapted.chipLoadMm, "chipLoad", u)}</td>
                </tr>
                <tr>
                  <td className="pr-3">ap</td>
                  <td className="pr-3">{formatQuantity(op.reference.axialDepthMm, "length", u)}</td>
                  <td>{formatQuantity(op.adapted.axialDepthMm, "length", u)}</td>
                </tr>
                <tr>
                  <td className="pr-3">ae</td>
                  <td className="pr-3">{formatQuantity(op.reference.radialDepthMm, "length", u)}</td>
                  <td>{formatQuantity(op.adapted.radialDepthMm, "length", u)}</td>
                </tr>
                <tr>
                  <td className="pr-3">vc</td>
                  <td className="pr-3">{sheetValue(op.reference.cuttingSpeedMpm, "cuttingSpeed", u)}</td>
                  <td>{formatQuantity(op.adapted.cuttingSpeedMpm, "cuttingSpeed", u)}</td>
                </tr>
                {op.adapted.plungeFeedMmMin != null ? (
                  <tr>
                    <td className="pr-3">Plunge</td>
                    <td className="pr-3">{sheetValue(op.reference.plungeFeedMmMin, "feedRate", u)}</td>
                    <td>{formatQuantity(op.adapted.plungeFeedMmMin, "feedRate", u)}</td>
                  </tr>
                ) : null}
              </tbody>
            </table>
          ) : (
            <p className="text-sm text-red-800">
              <span aria-hidden>⚠ </span>Not adapted: {op.error}
            </p>
          )}
          {op.steps.length ? (
            <details className="mt-2 text-sm">
              <summary className="cursor-pointer text-stone-700">
                How these numbers were found ({op.steps.length} {op.steps.length === 1 ? "step" : "steps"})
              </summary>
              <ol className="mt-1 list-decimal space-y-1 pl-6">
                {op.steps.map((s, j) => (
                  <li key={j}>
                    <span className="font-medium">{s.title}</span>:{" "}
                    <span className="num">
                      {formatQuantity(s.before, kindOf(s.quantity), u)} → {formatQuantity(s.after, kindOf(s.quantity), u)}
                    </span>
                    . {s.why} <span className="text-stone-600">Source: {s.source}</span>
                  </li>
                ))}
              </ol>
            </details>
          ) : null}
          {op.warnings.length ? (
            <ul className="mt-2 space-y-1 text-sm">
              {op.warnings.map((w, j) => (
                <li key={j} className="rounded border-l-4 border-amber-600 bg-amber-50 px-2 py-1">
                  <span aria-hidden>⚠ </span>
                  <strong>{w.title}.</strong> {w.message}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ))}
      {card.cautions.length ? (
        <ul className="mt-3 space-y-1 text-sm">
          {card.cautions.map((c, i) => (
            <li key={i} className="rounded border-l-4 border-amber-600 bg-amber-50 px-2 py-1">
              <span aria-hidden>⚠ </span>
              {c.text}
            </li>
          ))}
        </ul>
      ) : null}
      <p className="mt-3 text-xs text-stone-600">
        Starting values computed {formatDateTime(card.computedAt)} from the sheet and your machine; they are not a promise of safety.
      </p>
    </section>
  );
}
