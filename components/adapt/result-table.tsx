import type { ContextOperation } from "@/lib/adapt/adapt-context";
import { numbersDiffer } from "@/lib/bench/setup-sheet-data";
import { ballNoseEffectiveDiameter, formatQuantity, type AdaptNumbers, type QuantityKind, type UnitSystem } from "@/lib/machining";

type Row = { key: string; label: string; kind: QuantityKind; sheet: number | null; adapted: number | null };

export function resultRows(
  op: ContextOperation,
  cutter: { diameterMm: number; flutes: number; cornerForm?: string },
  adapted: AdaptNumbers | null,
): Row[] {
  const a = (v: number | null | undefined) => (adapted ? (v ?? null) : null);
  // A ball nose cuts at De < D when shallow; its vc is judged there, on the sheet as on the customer's machine.
  const ball = cutter.cornerForm === "ball";
  const sheetDe = ball ? ballNoseEffectiveDiameter({ diameterMm: cutter.diameterMm, axialDepthMm: op.axialDepthMm }) : cutter.diameterMm;
  return [
    { key: "n", label: "n (spindle speed)", kind: "spindleSpeed", sheet: op.rpm, adapted: a(adapted?.rpm) },
    { key: "vf", label: "vf (feed rate)", kind: "feedRate", sheet: op.feedMmMin, adapted: a(adapted?.feedMmMin) },
    {
      key: "fz",
      label: "fz (chip load)",
      kind: "chipLoad",
      sheet: op.feedMmMin / (cutter.flutes * op.rpm),
      adapted: a(adapted?.chipLoadMm),
    },
    ...(ball
      ? [
          {
            key: "de",
            label: "De (effective diameter of the ball)",
            kind: "length" as const,
            sheet: sheetDe,
            adapted: a(adapted?.effectiveDiameterMm),
          },
        ]
      : []),
    {
      key: "vc",
      label: ball ? "vc (cutting speed at De)" : "vc (cutting speed)",
      kind: "cuttingSpeed",
      sheet: (Math.PI * sheetDe * op.rpm) / 1000,
      adapted: a(adapted?.cuttingSpeedMpm),
    },
    { key: "ap", label: "ap (axial depth)", kind: "length", sheet: op.axialDepthMm, adapted: a(adapted?.axialDepthMm) },
    { key: "ae", label: "ae (radial depth)", kind: "length", sheet: op.radialDepthMm, adapted: a(adapted?.radialDepthMm) },
    { key: "plunge", label: "Plunge feed", kind: "feedRate", sheet: op.plungeFeedMmMin, adapted: a(adapted?.plungeFeedMmMin) },
    { key: "q", label: "Q (removal rate)", kind: "removalRate", sheet: null, adapted: a(adapted?.mrrCm3Min) },
    { key: "pc", label: "Pc (cutting power)", kind: "power", sheet: null, adapted: a(adapted?.powerKw) },
    { key: "defl", label: "Tool deflection", kind: "deflection", sheet: null, adapted: a(adapted?.deflectionMm) },
  ];
}

const differs = (r: Row) => numbersDiffer(r.sheet, r.adapted);

/** The sheet's numbers beside the adapted ones; a changed number is marked with a word, not only a colour. */
export function ResultTable({
  rows,
  units,
  headings = ["Sheet", "Your machine"],
}: {
  rows: Row[];
  units: UnitSystem;
  headings?: [string, string];
}) {
  return (
    // On a phone the table scrolls inside its own box instead of pushing the page sideways.
    <div
      role="region"
      aria-label="Numbers: the sheet's and your machine's"
      tabIndex={0}
      className="mt-3 max-w-full overflow-x-auto"
      data-result-table
    >
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-stone-300 text-left">
            <th scope="col" className="py-2 pr-2 font-medium">
              Quantity
            </th>
            <th scope="col" className="py-2 pr-2 text-right font-medium">
              {headings[0]}
            </th>
            <th scope="col" className="py-2 text-right font-medium">
              {headings[1]}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} data-row={r.key} className="border-b border-stone-200">
              <th scope="row" className="py-2 pr-2 text-left font-normal">
                {r.label}
              </th>
              <td className="num py-2 pr-2 text-right text-stone-600">{formatQuantity(r.sheet, r.kind, units)}</td>
              <td data-testid={`adapted-${r.key}`} className={`num py-2 text-right ${differs(r) ? "font-semibold text-stone-950" : ""}`}>
                {formatQuantity(r.adapted, r.kind, units)}
                {differs(r) ? <span className="block text-xs font-normal text-amber-800 sm:ml-1 sm:inline">changed</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
