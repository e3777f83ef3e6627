import Link from "next/link";

import { formatDate } from "@/components/library/format-date";
import type { LinkedTicket } from "@/lib/field/sheet-field-results";

export function LinkedTicketList({ tickets, vendorSlug, deskLinks }: { tickets: LinkedTicket[]; vendorSlug: string; deskLinks: boolean }) {
  if (!tickets.length) return <p className="text-sm text-stone-600">No ticket links a version of this sheet.</p>;
  return (
    <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white text-sm">
      {tickets.map((t) => (
        <li key={`${t.id}:${t.versionNumber}`} className="flex flex-wrap items-baseline gap-2 px-4 py-3">
          <span className="num text-stone-600">#{t.number}</span>
          {deskLinks ? (
            <Link className="font-medium underline" href={`/${vendorSlug}/desk/tickets/${t.id}`}>
              {t.subject}
            </Link>
          ) : (
            <span className="font-medium">{t.subject}</span>
          )}
          <span className="num text-stone-600">v{t.versionNumber}</span>
          <span className="text-stone-600">
            {t.status.replace(/_/g, " ")} · {formatDate(t.createdAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
