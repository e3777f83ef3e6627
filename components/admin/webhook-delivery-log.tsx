import { EmptyState } from "@/components/ui/empty-state";
import type { FormAction } from "@/lib/actions/action-state";
import { formatDateTime } from "@/lib/ui/dates";
import type { WebhookDelivery } from "@/lib/webhooks/webhook-rows";

import { RedeliverButton } from "./redeliver-button";

const STATE_WORDS: Record<WebhookDelivery["state"], string> = {
  pending: "Queued",
  retrying: "Failed, trying again",
  delivered: "Delivered",
  failed: "Failed, gave up",
  held: "Held while paused",
};

export function WebhookDeliveryLog({
  vendor,
  webhookId,
  deliveries,
  redeliverAction,
}: {
  vendor: string;
  webhookId: string;
  deliveries: WebhookDelivery[];
  redeliverAction: FormAction;
}) {
  if (deliveries.length === 0) return <EmptyState title="Nothing delivered yet." />;
  return (
    <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th className="px-3 py-2">Event</th>
            <th className="px-3 py-2">When</th>
            <th className="px-3 py-2">State</th>
            <th className="px-3 py-2">Answer</th>
            <th className="px-3 py-2">Attempts</th>
            <th className="px-3 py-2">
              <span className="sr-only">Send again</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {deliveries.map((d) => (
            <tr key={d.id} className="border-t border-stone-100 align-top" data-delivery-event={d.eventType} data-delivery-state={d.state}>
              <td className="px-3 py-2">
                <code>{d.eventType}</code>
                <div className="num text-xs text-stone-500">{d.eventId}</div>
              </td>
              <td className="px-3 py-2">
                {formatDateTime(d.lastAttemptAt ?? d.createdAt)}
                {d.nextAttemptAt ? <div className="text-xs text-stone-600">next try {formatDateTime(d.nextAttemptAt)}</div> : null}
              </td>
              <td className="px-3 py-2">{STATE_WORDS[d.state]}</td>
              <td className="px-3 py-2">
                <span className="num" data-status={d.lastStatus ?? ""}>
                  {d.lastStatus ?? "—"}
                </span>
                {d.durationMs !== null ? <span className="num text-stone-500"> in {d.durationMs} ms</span> : null}
                {d.lastError ? <div className="text-xs text-red-800">{d.lastError}</div> : null}
                {d.responseExcerpt ? (
                  <pre className="mt-1 max-w-md whitespace-pre-wrap break-all text-xs text-stone-600">{d.responseExcerpt}</pre>
                ) : null}
              </td>
              <td className="num px-3 py-2">{d.attempts}</td>
              <td className="px-3 py-2">
                {d.state === "pending" || d.state === "retrying" ? null : (
                  <RedeliverButton vendor={vendor} webhookId={webhookId} deliveryId={d.id} redeliverAction={redeliverAction} />
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
