import type { PreviewCell } from "@/lib/families/preview-family";

import { CellStatusBadge } from "./cell-status-badge";
import { DiffSummary } from "./diff-summary";

/** The preview: per cell (cutter × material × machine class) the derived operations, the engine's warnings and the change against the current version. */
export function PreviewGrid({ cells, vendorSlug }: { cells: PreviewCell[]; vendorSlug: string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
      <table className="w-full text-sm" data-testid="family-preview">
        <caption className="sr-only">Preview of the family&apos;s sheets</caption>
        <thead className="bg-stone-100 text-left">
          <tr>
            <th scope="col" className="px-3 py-2">
              Cutter
            </th>
            <th scope="col" className="px-3 py-2">
              Material
            </th>
            <th scope="col" className="px-3 py-2">
              Machine class
            </th>
            <th scope="col" className="px-3 py-2">
              Outcome
            </th>
            <th scope="col" className="px-3 py-2">
              Operations (n · vf · ap · ae)
            </th>
            <th scope="col" className="px-3 py-2">
              Engine warnings
            </th>
            <th scope="col" className="px-3 py-2">
              Against the current version
            </th>
          </tr>
        </thead>
        <tbody>
          {cells.map((cell) => (
            <tr
              key={cell.key}
              data-cell={`${cell.cutter.sku}/${cell.material.slug}/${cell.machineClass.slug}`}
              data-status={cell.status}
              className="border-t border-stone-200 align-top"
            >
              <th scope="row" className="px-3 py-2 text-left font-medium">
                {cell.cutter.sku}
                <span className="num block text-xs font-normal text-stone-600">
                  D {cell.cutter.diameterMm} mm · z {cell.cutter.flutes}
                </span>
              </th>
              <td className="px-3 py-2">{cell.material.name}</td>
              <td className="px-3 py-2">{cell.machineClass.name}</td>
              <td className="px-3 py-2">
                <CellStatusBadge status={cell.status} />
                {cell.existing ? (
                  <a className="mt-1 block text-xs underline" href={`/${vendorSlug}/drafting/sheets/${cell.existing.slug}`}>
                    v{cell.existing.number}
                  </a>
                ) : null}
              </td>
              <td className="px-3 py-2">
                <ul className="flex flex-col gap-0.5">
                  {cell.operations.map((op) => (
                    <li key={op.operation.kind}>
                      {op.operation.label}:{" "}
                      <span className="num whitespace-nowrap">
                        {op.operation.n.text} · {op.operation.vf.text} · {op.operation.ap.text} · {op.operation.ae.text}
                      </span>
                      <span className="block text-xs text-stone-600">
                        {op.rules.length ? `rule ${op.rules.join(", ")}` : "material's own data"}
                      </span>
                    </li>
                  ))}
                </ul>
              </td>
              <td className="px-3 py-2">
                {cell.warnings.length ? (
                  <ul className="flex flex-col gap-1 text-red-900">
                    {cell.warnings.map((w) => (
                      <li key={`${w.operation}-${w.code}`} data-warning={w.code}>
                        <span aria-hidden>⚠ </span>
                        <strong>{w.operation}</strong>: {w.message}
                      </li>
                    ))}
                  </ul>
                ) : (
                  <span className="text-stone-600">none</span>
                )}
              </td>
              <td className="px-3 py-2">
                <DiffSummary diff={cell.diff} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
