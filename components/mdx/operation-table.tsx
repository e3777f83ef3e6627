import { operationTablePropsSchema } from "@/content-schema/mdx-components";
import { operationCells } from "@/lib/library/operation-cells";

import type { SheetRenderContext } from "./sheet-render-context";

export type OperationTableMdxProps = { only?: string };

const th =
  "border-b-2 border-stone-400 px-3 py-2 align-bottom text-xs font-semibold uppercase tracking-wide text-stone-600 print:text-black";
const td = "border-b border-stone-200 px-3 py-2 align-top";
const num = `${td} whitespace-nowrap text-right font-mono tabular-nums`;

/** The sheet's operations as a data-sheet table, every number with its unit. */
export function OperationTable({ only, context }: OperationTableMdxProps & { context: SheetRenderContext }) {
  const parsed = operationTablePropsSchema.safeParse({ only });
  const kinds = parsed.success ? parsed.data.only : undefined;
  const rows = context.frontMatter.operations.map((op, index) => ({ op, index })).filter(({ op }) => !kinds || kinds.includes(op.kind));
  if (rows.length === 0) return null;
  const withFz = Boolean(context.cutter?.flutes);
  const system = context.units === "imperial" ? "imperial units" : "metric units";
  return (
    <div className="my-6 overflow-x-auto print:overflow-visible">
      <table className="w-full border-collapse text-sm text-stone-900" data-units={context.units}>
        <caption className="sr-only">Cutting data per operation, in {system}</caption>
        <thead>
          <tr>
            <th scope="col" className={`${th} text-left`}>
              Operation
            </th>
            <th scope="col" className={`${th} text-right`}>
              n
            </th>
            <th scope="col" className={`${th} text-right`}>
              vf
            </th>
            {withFz ? (
              <th scope="col" className={`${th} text-right`}>
                fz
              </th>
            ) : null}
            <th scope="col" className={`${th} text-right`}>
              ap
            </th>
            <th scope="col" className={`${th} text-right`}>
              ae
            </th>
            <th scope="col" className={`${th} text-right`}>
              Plunge feed
            </th>
            <th scope="col" className={`${th} text-left`}>
              Entry
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ op, index }) => {
            const cells = operationCells(op, context.units, context.cutter);
            return (
              <tr key={index} data-operation={index} className="break-inside-avoid">
                <th scope="row" className={`${td} text-left font-medium`}>
                  {cells.operation}
                  {op.label ? <span className="block text-xs font-normal text-stone-500">{cells.kind}</span> : null}
                  {op.notes ? <span className="block text-xs font-normal text-stone-600">{op.notes}</span> : null}
                </th>
                <td className={num} title={`as written: ${op.n.text}`}>
                  {cells.n}
                </td>
                <td className={num} title={`as written: ${op.vf.text}`}>
                  {cells.vf}
                </td>
                {withFz ? <td className={num}>{cells.fz}</td> : null}
                <td className={num} title={`as written: ${op.ap.text}`}>
                  {cells.ap}
                </td>
                <td className={num} title={`as written: ${op.ae.text}`}>
                  {cells.ae}
                </td>
                <td className={num}>{cells.plungeFeed}</td>
                <td className={td}>
                  {cells.entry}
                  {cells.rampAngle ? <span className="font-mono tabular-nums">, {cells.rampAngle}</span> : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
