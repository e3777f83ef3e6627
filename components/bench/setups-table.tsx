import Link from "next/link";

import type { SetupSummary } from "@/lib/bench/list-setups";

import { OutcomeBadge } from "./outcome-badge";

/** Saved setups: machine, sheet, pinned version (with a badge when a newer one exists), last outcome. */
export function SetupsTable({ setups, vendorSlug }: { setups: SetupSummary[]; vendorSlug: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[40rem] border-collapse text-sm">
        <thead>
          <tr className="border-b border-stone-300 text-left">
            <th scope="col" className="py-2 pr-3 font-medium">
              Setup
            </th>
            <th scope="col" className="py-2 pr-3 font-medium">
              Machine
            </th>
            <th scope="col" className="py-2 pr-3 font-medium">
              Sheet
            </th>
            <th scope="col" className="py-2 pr-3 font-medium">
              Version
            </th>
            <th scope="col" className="py-2 font-medium">
              Last outcome
            </th>
          </tr>
        </thead>
        <tbody>
          {setups.map((s) => (
            <tr key={s.id} data-setup={s.id} className="border-b border-stone-200 align-top">
              <td className="py-2 pr-3">
                <Link className="inline-block min-h-11 py-2 font-medium underline" href={`/${vendorSlug}/bench/setups/${s.id}`}>
                  {s.name}
                </Link>
              </td>
              <td className="py-2 pr-3">{s.machineName}</td>
              <td className="py-2 pr-3">
                <Link className="underline" href={`/${vendorSlug}/library/${s.sheetSlug}/v/${s.versionNumber}`}>
                  {s.sheetTitle}
                </Link>
              </td>
              <td className="num py-2 pr-3">
                v{s.versionNumber}
                {s.newerVersionNumber ? (
                  <Link
                    data-newer
                    href={`/${vendorSlug}/bench/setups/${s.id}#readapt`}
                    className="ml-2 inline-flex items-center gap-1 rounded border border-amber-600 bg-amber-50 px-2 py-0.5 text-xs text-amber-900"
                  >
                    <span aria-hidden>↑</span>v{s.newerVersionNumber} is out: re-adapt
                  </Link>
                ) : null}
                {s.versionState === "withdrawn" ? (
                  <span className="ml-2 rounded border border-red-700 px-2 py-0.5 text-xs text-red-900">withdrawn</span>
                ) : null}
              </td>
              <td className="py-2">
                {s.lastOutcome ? (
                  <OutcomeBadge result={s.lastOutcome.result} symptom={s.lastOutcome.symptom} />
                ) : (
                  <span className="text-stone-500">not reported yet</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
