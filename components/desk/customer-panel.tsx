import Link from "next/link";

import { formatDateTime, StatusBadge } from "@/components/support/ticket-badges";
import type { TicketStatus } from "@/content-schema/ticket-status";
import type { CustomerContext } from "@/lib/desk/customer-context";
import { formatFeed, formatPower, formatSpindleSpeed } from "@/lib/machining";
import type { LinkedSheet, TicketDetail } from "@/lib/tickets/ticket-types";

/** Beside the thread: linked sheet versions, the customer's machines, setups and other tickets. */
export function CustomerPanel({
  vendorSlug,
  context,
  links,
  ticket,
}: {
  vendorSlug: string;
  context: CustomerContext;
  links: LinkedSheet[];
  ticket: TicketDetail;
}) {
  return (
    <section aria-labelledby="customer-h" className="space-y-4 text-sm">
      <h2 id="customer-h" className="font-semibold">
        Customer
      </h2>
      {ticket.satisfaction ? (
        <p>
          Rating: <span className="num">{ticket.satisfaction}/5</span>
          {ticket.satisfactionComment ? ` “${ticket.satisfactionComment}”` : ""}
        </p>
      ) : null}
      <div>
        <h3 className="font-medium">Linked sheet versions</h3>
        {links.length ? (
          <ul className="mt-1 space-y-1">
            {links.map((l) => (
              <li key={l.sheetVersionId}>
                <Link className="underline" href={`/${vendorSlug}/library/${l.sheetSlug}/v/${l.versionNumber}`}>
                  {l.title} <span className="num">v{l.versionNumber}</span>
                </Link>
                {l.machineName ? <span className="text-stone-600"> on {l.machineName}</span> : null}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-stone-600">None.</p>
        )}
      </div>
      <div>
        <h3 className="font-medium">Machines</h3>
        {context.machines.length ? (
          <ul className="mt-1 space-y-1">
            {context.machines.map((m) => (
              <li key={m.id}>
                <strong>{m.name}</strong>
                {m.id === ticket.machineId ? " (on this ticket)" : ""}
                <br />
                <span className="num text-stone-700">
                  {formatSpindleSpeed(m.rpmMin)}–{formatSpindleSpeed(m.rpmMax)}, {formatPower(m.powerKw, m.units)}, max{" "}
                  {formatFeed(m.maxFeedMmMin, m.units)}, rigidity {m.rigidity}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-stone-600">No machines saved.</p>
        )}
      </div>
      <div>
        <h3 className="font-medium">Setups</h3>
        {context.setups.length ? (
          <ul className="mt-1 space-y-1">
            {context.setups.map((s) => (
              <li key={s.id}>
                {s.name || s.sheetTitle} <span className="num">v{s.versionNumber}</span> on {s.machineName}
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-stone-600">No saved setups.</p>
        )}
      </div>
      <div>
        <h3 className="font-medium">Other tickets</h3>
        {context.pastTickets.length ? (
          <ul className="mt-1 space-y-1">
            {context.pastTickets.map((t) => (
              <li key={t.id}>
                <Link className="underline" href={`/${vendorSlug}/desk/tickets/${t.id}`}>
                  <span className="num">#{t.number}</span> {t.subject}
                </Link>{" "}
                <StatusBadge status={t.status as TicketStatus} /> <span className="text-stone-600">{formatDateTime(t.createdAt)}</span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-stone-600">None.</p>
        )}
      </div>
    </section>
  );
}
