import Link from "next/link";

import { CautionIcon } from "@/components/mdx/caution-icon";
import type { SheetVersion } from "@/lib/sheets/sheet-types";

import { formatDate } from "./format-date";

/** Says plainly when the reader is not looking at the current version. */
export function VersionBanner({
  version,
  current,
  href,
}: {
  version: SheetVersion;
  current: SheetVersion | null;
  href: (n: number) => string;
}) {
  if (version.state === "withdrawn") {
    return (
      <div
        role="alert"
        className="mb-6 rounded-md border border-red-300 border-l-4 border-l-red-700 bg-red-50 p-4 text-red-950 print:bg-white"
      >
        <p className="flex items-center gap-2 font-semibold">
          <CautionIcon /> Withdrawn on {formatDate(version.withdrawnAt)}: do not cut with this version.
        </p>
        <p className="mt-1">Reason: {version.withdrawnReason}</p>
        {current ? (
          <p className="mt-1">
            <Link href={href(current.number)} className="font-medium underline">
              Read the current version {current.number}
            </Link>
          </p>
        ) : null}
      </div>
    );
  }
  if (version.state === "superseded") {
    return (
      <div
        role="status"
        className="mb-6 rounded-md border border-amber-300 border-l-4 border-l-amber-600 bg-amber-50 p-4 text-amber-950 print:bg-white"
      >
        <p className="font-semibold">⚠ Superseded on {formatDate(version.supersededAt)}: this is an older version.</p>
        {current ? (
          <p className="mt-1">
            <Link href={href(current.number)} className="font-medium underline">
              Read the current version {current.number}
            </Link>
          </p>
        ) : (
          <p className="mt-1">No version of this sheet is published at the moment.</p>
        )}
      </div>
    );
  }
  return null;
}
