import Link from "next/link";
import { notFound } from "next/navigation";

import { WebhookDeliveryLog } from "@/components/admin/webhook-delivery-log";
import { WebhookStateActions } from "@/components/admin/webhook-state-actions";
import { PageHeader } from "@/components/ui/page-header";
import { webhookEventLabels } from "@/content-schema/webhook-events";
import { formatDateTime } from "@/lib/ui/dates";
import { listDeliveries } from "@/lib/webhooks/list-webhooks";
import { findAdminWebhook } from "@/lib/webhooks/page-data";
import { REPLAY_WINDOW_SECONDS } from "@/lib/webhooks/sign-payload";

import { deleteWebhookAction, redeliverAction, resumeWebhookAction } from "../../actions";

export const metadata = { title: "Webhook" };

export default async function WebhookPage({ params }: { params: Promise<{ vendor: string; webhook: string }> }) {
  const { vendor: slug, webhook: webhookId } = await params;
  // The layout answered 404 for a webhook that is not this vendor's; this is the same (cached) lookup.
  const found = await findAdminWebhook(slug, webhookId);
  if (!found) notFound();
  const { vendor, webhook: hook } = found;
  const deliveries = await listDeliveries({ vendorId: vendor.id, webhookId });
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href={`/${vendor.slug}/admin/integrations`} className="underline">
          ← Integrations
        </Link>
      </p>
      <PageHeader title="Webhook" lead={hook.description || "Deliveries to one address, signed with its own secret."} />
      <dl className="mb-6 grid gap-x-6 gap-y-2 rounded-lg border border-stone-200 bg-white p-4 text-sm sm:grid-cols-[max-content_1fr]">
        <dt className="font-medium">Address</dt>
        <dd className="num break-all">{hook.url}</dd>
        <dt className="font-medium">Events</dt>
        <dd>{hook.events.map((e) => `${e} (${webhookEventLabels[e].toLowerCase()})`).join(", ")}</dd>
        <dt className="font-medium">State</dt>
        <dd data-webhook-state={hook.state}>
          {hook.state === "paused"
            ? `Paused ${hook.pausedAt ? formatDateTime(hook.pausedAt) : ""} after ${hook.consecutiveFailures} failed attempts in a row; new events are kept until you resume.`
            : `Active (${hook.consecutiveFailures} failed attempts in a row)`}
        </dd>
        <dt className="font-medium">Signing secret</dt>
        <dd className="num">{hook.secretHint} (shown in full only when the webhook was added)</dd>
        <dt className="font-medium">Checking a delivery</dt>
        <dd>
          HMAC-SHA256 with the secret over <code>Swarfbook-Timestamp</code>, a dot and the raw body must equal{" "}
          <code>Swarfbook-Signature</code> (after <code>sha256=</code>); refuse timestamps more than {REPLAY_WINDOW_SECONDS / 60} minutes
          from your clock. See the{" "}
          <Link href="/developers/api#webhooks" className="underline">
            API reference
          </Link>
          .
        </dd>
      </dl>
      <div className="mb-8">
        <WebhookStateActions
          vendor={vendor.slug}
          webhookId={hook.id}
          state={hook.state}
          resumeWebhookAction={resumeWebhookAction}
          deleteWebhookAction={deleteWebhookAction}
        />
      </div>
      <h2 className="mb-3 text-lg font-semibold">Delivery log</h2>
      <WebhookDeliveryLog vendor={vendor.slug} webhookId={hook.id} deliveries={deliveries} redeliverAction={redeliverAction} />
    </>
  );
}
