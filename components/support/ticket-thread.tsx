import type { TicketAttachment, TicketMessage } from "@/lib/tickets/ticket-types";

import { AdaptedCard } from "./adapted-card";
import { SafeMarkdown } from "./safe-markdown";
import { formatDateTime } from "./ticket-badges";

export function AttachmentList({ vendorSlug, attachments }: { vendorSlug: string; attachments: TicketAttachment[] }) {
  if (!attachments.length) return null;
  return (
    <ul className="mt-2 flex flex-wrap gap-3" aria-label="Attachments">
      {attachments.map((a) => {
        const href = `/api/v1/vendors/${vendorSlug}/attachments/${a.id}`;
        return (
          <li key={a.id} className="rounded border border-stone-200 bg-white p-2 text-sm">
            {a.kind === "image" ? (
              // eslint-disable-next-line @next/next/no-img-element -- served by our own authorised route
              <img src={href} alt={a.fileName} className="mb-1 max-h-40 max-w-60 rounded object-contain" />
            ) : null}
            <a href={href} className="underline underline-offset-2">
              {a.fileName}
            </a>{" "}
            <span className="num text-stone-600">({Math.max(1, Math.round(a.sizeBytes / 1024))}&nbsp;KB)</span>
          </li>
        );
      })}
    </ul>
  );
}

/** The thread as a list of messages; internal notes are marked (and only ever given to staff). */
export function TicketThreadView({
  vendorSlug,
  messages,
  attachments,
}: {
  vendorSlug: string;
  messages: Omit<TicketMessage, "authorId">[];
  attachments: TicketAttachment[];
}) {
  if (!messages.length) return <p className="text-sm text-stone-600">No replies yet.</p>;
  return (
    <ol className="space-y-4" aria-label="Thread">
      {messages.map((m) => (
        <li
          key={m.id}
          data-message-visibility={m.visibility}
          className={`rounded-lg border p-4 ${m.visibility === "note" ? "border-amber-400 bg-amber-50" : m.authorIsStaff ? "border-stone-300 bg-white" : "border-stone-200 bg-stone-50"}`}
        >
          <p className="mb-2 text-sm text-stone-600">
            <span className="font-medium text-stone-900">{m.authorName}</span>
            {m.authorIsStaff ? " (support)" : ""} · {formatDateTime(m.createdAt)}
            {m.source === "email" ? " · by e-mail" : ""}
            {m.visibility === "note" ? <strong className="ml-2 text-amber-900">Internal note: not shown to the customer</strong> : null}
          </p>
          <SafeMarkdown source={m.body} />
          {m.card ? <AdaptedCard card={m.card} vendorSlug={vendorSlug} /> : null}
          <AttachmentList vendorSlug={vendorSlug} attachments={attachments.filter((a) => a.messageId === m.id)} />
        </li>
      ))}
    </ol>
  );
}
