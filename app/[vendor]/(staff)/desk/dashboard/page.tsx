import Link from "next/link";

import { saveSnippetAction } from "@/app/[vendor]/(staff)/desk/actions";
import { SnippetForm } from "@/components/desk/snippet-form";
import { TicketsPerVersionChart } from "@/components/desk/tickets-per-version-chart";
import { PageHeader } from "@/components/ui/page-header";
import { ticketStatusLabels, type TicketStatus } from "@/content-schema/ticket-status";
import { requirePageAccess } from "@/lib/auth/page-access";
import { getDeskDashboard } from "@/lib/desk/dashboard-stats";
import { listSnippets } from "@/lib/desk/snippets";

export const metadata = { title: "Desk dashboard" };

const hours = (h: number) => (h < 1 ? `${Math.round(h * 60)}\u00a0min` : `${h.toFixed(1)}\u00a0h`);

export default async function DeskDashboardPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "desk.use", `/${slug}/desk/dashboard`);
  const [stats, snippets] = await Promise.all([getDeskDashboard({ vendorId: vendor.id }), listSnippets({ vendorId: vendor.id })]);
  const open = stats.openByStatus.reduce((sum, s) => sum + s.count, 0);
  const targets = vendor.settings.firstResponseHours;
  return (
    <>
      <PageHeader
        title="Desk dashboard"
        lead="Open tickets, response times and which sheet versions bring questions."
        actions={
          <Link href={`/${vendor.slug}/desk`} className="underline">
            Back to the queue
          </Link>
        }
      />
      <dl className="mb-8 grid gap-4 sm:grid-cols-3">
        <div className="rounded-lg border border-stone-200 bg-white p-4">
          <dt className="text-sm text-stone-600">Open tickets</dt>
          <dd className="num text-3xl">{open}</dd>
        </div>
        <div className="rounded-lg border border-stone-200 bg-white p-4">
          <dt className="text-sm text-stone-600">Overdue for a first reply</dt>
          <dd className={`num text-3xl ${stats.overdue ? "text-red-800" : ""}`}>
            {stats.overdue ? <span aria-hidden>⚠ </span> : null}
            {stats.overdue}
          </dd>
        </div>
        <div className="rounded-lg border border-stone-200 bg-white p-4">
          <dt className="text-sm text-stone-600">Median first reply (90 days, {stats.answeredCount} tickets)</dt>
          <dd className="num text-3xl">{stats.medianFirstResponseHours == null ? "—" : hours(stats.medianFirstResponseHours)}</dd>
        </div>
      </dl>
      <section className="mb-8" aria-labelledby="by-status">
        <h2 id="by-status" className="mb-2 text-lg font-semibold">
          Open by status
        </h2>
        <ul className="flex flex-wrap gap-4 text-sm">
          {stats.openByStatus.map((s) => (
            <li key={s.status}>
              {ticketStatusLabels[s.status as TicketStatus] ?? s.status}: <span className="num">{s.count}</span>
            </li>
          ))}
          {stats.openByStatus.length === 0 ? <li>No open tickets.</li> : null}
        </ul>
        <p className="mt-2 text-sm text-stone-600">
          First-reply targets:{" "}
          <span className="num">
            urgent {targets.urgent}&nbsp;h, high {targets.high}&nbsp;h, normal {targets.normal}&nbsp;h, low {targets.low}&nbsp;h
          </span>
          .
        </p>
      </section>
      <section aria-labelledby="per-version">
        <h2 id="per-version" className="mb-2 text-lg font-semibold">
          Tickets per sheet version
        </h2>
        <TicketsPerVersionChart data={stats.perSheetVersion} />
      </section>
      <section className="mt-8" aria-labelledby="snippets">
        <h2 id="snippets" className="mb-2 text-lg font-semibold">
          Reply snippets
        </h2>
        <ul className="mb-4 list-disc pl-6 text-sm">
          {snippets.map((s) => (
            <li key={s.id}>
              <strong>{s.title}</strong>:{" "}
              <span className="text-stone-600">
                {s.body.slice(0, 120)}
                {s.body.length > 120 ? "…" : ""}
              </span>
            </li>
          ))}
        </ul>
        <SnippetForm saveSnippetAction={saveSnippetAction} vendor={vendor.slug} />
      </section>
    </>
  );
}
