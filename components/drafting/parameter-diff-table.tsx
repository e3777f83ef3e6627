import type { UnitSystem } from "@/lib/machining";
import { formatParameterChange, type OperationDiff } from "@/lib/sheets/parameter-diff";

const STATUS: Record<OperationDiff["status"], string> = { changed: "changed", unchanged: "no change", added: "added", removed: "removed" };

/** Which parameters changed per operation, and by how much, in the reader's units. */
export function ParameterDiffTable({ diff, units }: { diff: OperationDiff[]; units: UnitSystem }) {
  return (
    <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
      <table className="w-full text-sm" data-testid="parameter-diff">
        <caption className="sr-only">Parameter changes</caption>
        <thead className="bg-stone-100 text-left">
          <tr>
            <th scope="col" className="px-3 py-2">
              Operation
            </th>
            <th scope="col" className="px-3 py-2">
              Parameter
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Before
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              After
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Change
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              %
            </th>
          </tr>
        </thead>
        <tbody>
          {diff.map((op) =>
            op.changes.length === 0 ? (
              <tr key={op.key} className="border-t border-stone-200">
                <th scope="row" className="px-3 py-2 text-left font-medium">
                  {op.label}
                </th>
                <td colSpan={5} className="px-3 py-2 text-stone-600">
                  {STATUS[op.status]}
                </td>
              </tr>
            ) : (
              op.changes.map((change, i) => {
                const text = formatParameterChange(change, units);
                return (
                  <tr key={`${op.key}-${change.parameter}`} data-parameter={change.parameter} className="border-t border-stone-200">
                    {i === 0 ? (
                      <th scope="rowgroup" rowSpan={op.changes.length} className="px-3 py-2 text-left align-top font-medium">
                        {op.label}
                        <span className="block text-xs font-normal text-stone-600">{STATUS[op.status]}</span>
                      </th>
                    ) : null}
                    <td className="px-3 py-2">{text.label}</td>
                    <td className="num px-3 py-2 text-right whitespace-nowrap">{text.before}</td>
                    <td className="num px-3 py-2 text-right whitespace-nowrap">{text.after}</td>
                    <td className="num px-3 py-2 text-right whitespace-nowrap">{text.delta}</td>
                    <td className="num px-3 py-2 text-right whitespace-nowrap">{text.percent}</td>
                  </tr>
                );
              })
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
