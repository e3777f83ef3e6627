import Link from "next/link";

import { formatDate } from "@/components/library/format-date";
import type { SheetVersion } from "@/lib/sheets/sheet-types";

import { StateBadge } from "./state-badge";

/** Every version with who did what when; readable versions link to the Library. */
export function VersionTable({ versions, libraryHref }: { versions: SheetVersion[]; libraryHref: (n: number) => string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
      <table className="w-full text-sm">
        <caption className="sr-only">Versions</caption>
        <thead className="bg-stone-100 text-left">
          <tr>
            <th scope="col" className="px-3 py-2">
              Version
            </th>
            <th scope="col" className="px-3 py-2">
              State
            </th>
            <th scope="col" className="px-3 py-2">
              Change note
            </th>
            <th scope="col" className="px-3 py-2">
              Author
            </th>
            <th scope="col" className="px-3 py-2">
              Approved by
            </th>
            <th scope="col" className="px-3 py-2">
              Published
            </th>
          </tr>
        </thead>
        <tbody>
          {versions.map((v) => (
            <tr key={v.id} className="border-t border-stone-200 align-top">
              <td className="num px-3 py-2">
                {["published", "superseded", "withdrawn"].includes(v.state) ? (
                  <Link className="underline" href={libraryHref(v.number)}>
                    v{v.number}
                  </Link>
                ) : (
                  `v${v.number}`
                )}
              </td>
              <td className="px-3 py-2">
                <StateBadge state={v.state} />
                {v.withdrawnReason ? <span className="mt-1 block text-xs text-red-900">{v.withdrawnReason}</span> : null}
              </td>
              <td className="px-3 py-2">{v.changeNote || "—"}</td>
              <td className="px-3 py-2">{v.authorName ?? "—"}</td>
              <td className="px-3 py-2">{v.approvedByName ?? "—"}</td>
              <td className="num px-3 py-2 whitespace-nowrap">{formatDate(v.publishedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
