import type { ActionState } from "@/lib/actions/action-state";
import { findSheetResults } from "@/lib/field/page-data";
import { formatDate } from "@/lib/ui/dates";

import { CustomerChangesList } from "./customer-changes-list";
import { FieldSection } from "./field-section";
import { LinkedTicketList } from "./linked-ticket-list";

type Props = {
  vendorSlug: string;
  vendorId: string;
  sheetId: string;
  z: number;
  deskLinks: boolean;
  startDraft?: (state: ActionState, form: FormData) => Promise<ActionState>;
};

/** What customers changed, linked tickets and hand-offs of one sheet. */
export async function SheetActivitySections({ vendorSlug, vendorId, sheetId, z, deskLinks, startDraft }: Props) {
  const results = await findSheetResults(vendorId, sheetId, z);
  if (!results) return null;
  return (
    <>
      <FieldSection
        id="sheet-changes"
        title="What customers changed"
        lead="Per version and operation, from “worked after changes” reports. A suggestion for the next draft, never applied for you: “Start a draft from this” opens a draft with the median change, for you to check, edit and send to review."
      >
        <CustomerChangesList items={results.changes} vendorSlug={vendorSlug} showSheet={false} startDraft={startDraft} />
      </FieldSection>
      <FieldSection
        id="sheet-tickets"
        title="Linked tickets"
        lead="Tickets that link a version of this sheet. A customer appears only here, through a ticket they opened."
      >
        <LinkedTicketList tickets={results.tickets} vendorSlug={vendorSlug} deskLinks={deskLinks} />
      </FieldSection>
      <FieldSection
        id="sheet-handoffs"
        title="Hand-offs from Support"
        lead="Problems Support handed to engineering for a version of this sheet."
      >
        {results.handoffs.length === 0 ? (
          <p className="text-sm text-stone-600">No hand-offs.</p>
        ) : (
          <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white text-sm">
            {results.handoffs.map((h) => (
              <li key={h.id} className="px-4 py-3">
                <span className="font-medium">{h.summary}</span> <span className="num text-stone-600">v{h.versionNumber}</span>{" "}
                <span className="rounded border border-stone-300 px-1.5 text-xs">{h.status === "open" ? "Open" : "Resolved"}</span>
                <span className="block text-stone-600">
                  {formatDate(h.createdAt)}
                  {h.ticketNumber ? ` · from ticket #${h.ticketNumber}` : ""}
                </span>
                {h.details ? <p className="mt-1 whitespace-pre-line">{h.details}</p> : null}
              </li>
            ))}
          </ul>
        )}
      </FieldSection>
    </>
  );
}
