import Link from "next/link";

import { WebhookForm } from "@/components/admin/webhook-form";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { webhookEventLabels } from "@/content-schema/webhook-events";
import { requirePageAccess } from "@/lib/auth/page-access";
import { formatDate } from "@/lib/ui/dates";
import { listWebhooks } from "@/lib/webhooks/list-webhooks";

import { createWebhookAction } from "./actions";

export const metadata = { title: "Integrations" };

export default async function IntegrationsPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "integrations.manage", `/${slug}/admin/integrations`);
  const hooks = await listWebhooks({ vendorId: vendor.id });
  return (
    <>
      <PageHeader
        title="Integrations"
        lead="Connect your web shop, ERP or lab scripts: the JSON API and webhooks that tell them when something happens."
      />
      <section aria-labelledby="api" className="mb-8 rounded-lg border border-stone-200 bg-white p-4 text-sm">
        <h2 id="api" className="mb-2 text-lg font-semibold">
          JSON API
        </h2>
        <p>
          Every endpoint, with examples in metric and imperial units, error shapes, rate limits and token scopes: the{" "}
          <Link href="/developers/api" className="underline">
            API reference
          </Link>
          , or the machine-readable{" "}
          <a href="/api/v1/openapi.json" className="underline">
            OpenAPI 3.1 document
          </a>
          . People create personal access tokens on their Bench.
        </p>
      </section>
      <section aria-labelledby="webhooks" className="mb-8">
        <h2 id="webhooks" className="mb-3 text-lg font-semibold">
          Webhooks
        </h2>
        {hooks.length === 0 ? (
          <EmptyState title="No webhooks yet." />
        ) : (
          <ul className="mb-6 divide-y divide-stone-100 rounded-lg border border-stone-200 bg-white text-sm" aria-label="Webhooks">
            {hooks.map((h) => (
              <li key={h.id} className="flex flex-wrap items-baseline gap-3 p-3" data-webhook-url={h.url}>
                <Link href={`/${vendor.slug}/admin/integrations/webhooks/${h.id}`} className="num font-medium underline break-all">
                  {h.url}
                </Link>
                <span className={h.state === "paused" ? "font-medium text-red-800" : "text-stone-600"}>
                  {h.state === "paused" ? "Paused" : "Active"}
                </span>
                <span className="text-stone-600">{h.events.map((e) => webhookEventLabels[e]).join("; ")}</span>
                <span className="ml-auto text-stone-500">since {formatDate(h.createdAt)}</span>
              </li>
            ))}
          </ul>
        )}
        <h3 className="mb-2 mt-6 font-semibold">Add a webhook</h3>
        <WebhookForm vendor={vendor.slug} createWebhookAction={createWebhookAction} />
      </section>
    </>
  );
}
