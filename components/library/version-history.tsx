import Link from "next/link";

import { sheetStateLabels } from "@/content-schema/sheet-workflow";
import type { SheetVersion } from "@/lib/sheets/sheet-types";

import { formatDate } from "./format-date";

export function VersionHistory({ history, shown, href }: { history: SheetVersion[]; shown: number; href: (n: number) => string }) {
  return (
    <section id="history" className="mt-10 break-inside-avoid">
      <h2 className="mb-2 text-lg font-semibold">Version history</h2>
      <ol className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white">
        {history.map((v) => (
          <li key={v.number} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 px-4 py-3 text-sm">
            <Link
              href={href(v.number)}
              aria-current={v.number === shown ? "page" : undefined}
              className="num font-semibold hover:underline aria-[current=page]:underline"
            >
              Version {v.number}
            </Link>
            <span className="text-stone-600">{sheetStateLabels[v.state]}</span>
            <span className="num text-stone-600">published {formatDate(v.publishedAt)}</span>
            <span className="w-full text-stone-800 sm:w-auto sm:flex-1">{v.changeNote || "—"}</span>
            {v.state === "withdrawn" && v.withdrawnReason ? (
              <span className="w-full text-red-900">Withdrawn: {v.withdrawnReason}</span>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
