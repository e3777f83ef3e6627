import Link from "next/link";
import { notFound } from "next/navigation";

import { OUTCOME_SYMPTOMS, outcomeSymptomLabels } from "@/content-schema/outcome-fields";
import { CustomerChangesList } from "@/components/field/customer-changes-list";
import { FieldCharts } from "@/components/field/field-charts";
import { FieldSection } from "@/components/field/field-section";
import { LinkedTicketList } from "@/components/field/linked-ticket-list";
import { findFieldSheetPage } from "@/lib/field/page-data";
import { VersionRollupTable } from "@/components/field/version-rollup-table";
import { formatDate } from "@/components/library/format-date";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/permissions";
import { compareVersions } from "@/lib/field/compare-versions";
import { confidenceOf } from "@/lib/field/confidence";
import { loadSheetFieldResults } from "@/lib/field/sheet-field-results";

export const metadata = { title: "Field results for a sheet" };

export default async function FieldSheetPage({ params }: { params: Promise<{ vendor: string; slug: string }> }) {
  const { vendor: slug, slug: sheetSlug } = await params;
  const found = await findFieldSheetPage(slug, sheetSlug);
  if (!found) notFound();
  const { access, sheet } = found;
  const { z, label } = confidenceOf(access.vendor.settings);
  const results = await loadSheetFieldResults({ vendorId: access.vendor.id, sheetId: sheet.id, z });
  if (!results) notFound();
  const { versions } = results;
  const comparisons = versions.slice(1).map((v, i) => ({ number: v.number, ...compareVersions(versions[i], v, label) }));
  const chartVersions = versions.map((v) => `v${v.number}`);
  const outcomes = versions.map((v) => ({ label: `v${v.number}`, asWritten: v.workedAsWritten, afterChanges: v.workedAfterChanges, failed: v.failed }));
  const symptoms = OUTCOME_SYMPTOMS.map((s) => ({ symptom: outcomeSymptomLabels[s], ...Object.fromEntries(versions.map((v) => [`v${v.number}`, v.symptoms[s]])) }));
  const deskLinks = access.member ? can(access.member.role, "desk.use") : false;
  return (
    <>
      <PageHeader
        title={results.sheet.title}
        lead={<>For the {results.sheet.machineClass} class; field results version by version. <Link className="underline" href={`/${slug}/drafting/sheets/${sheet.slug}`}>Open the sheet in Drafting</Link> · <Link className="underline" href={`/${slug}/drafting/field`}>All Field results</Link></>}
      />
      {versions.length === 0 ? (
        <p className="text-sm text-stone-600">No published version of this sheet has field results yet; they refresh every few minutes.</p>
      ) : (
        <>
          <div className="mb-2 flex justify-end">
            <a href={`/api/v1/vendors/${slug}/field/sheet-versions?sheet=${encodeURIComponent(sheet.slug)}`} className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3 text-sm" download>Export CSV<span className="sr-only"> of the versions</span></a>
          </div>
          <VersionRollupTable versions={versions} confidenceLabel={label} />
          {comparisons.length ? (
            <section aria-labelledby="compare-heading" className="mt-6">
              <h2 id="compare-heading" className="mb-2 text-lg font-semibold">Against the previous version</h2>
              <ul className="space-y-2 text-sm" data-testid="version-comparisons">
                {comparisons.map((c) => (
                  <li key={c.number} data-verdict={c.verdict} className="rounded-md border border-stone-300 bg-white px-4 py-3">
                    <strong>Version {c.number}:</strong> {c.sentence}
                    {versions.find((v) => v.number === c.number)?.changeNote ? <span className="block text-stone-600">Change note: {versions.find((v) => v.number === c.number)?.changeNote}</span> : null}
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          <FieldCharts outcomes={outcomes} symptoms={symptoms} versions={chartVersions} />
        </>
      )}
      <FieldSection id="sheet-changes" title="What customers changed" lead="Per version, from “worked after changes” reports. A suggestion for the next draft, never applied for you.">
        <CustomerChangesList items={results.changes} vendorSlug={slug} showSheet={false} />
      </FieldSection>
      <FieldSection id="sheet-tickets" title="Linked tickets" lead="Tickets that link a version of this sheet. A customer appears only here, through a ticket they opened.">
        <LinkedTicketList tickets={results.tickets} vendorSlug={slug} deskLinks={deskLinks} />
      </FieldSection>
      <FieldSection id="sheet-handoffs" title="Hand-offs from Support" lead="Problems Support handed to engineering for a version of this sheet.">
        {results.handoffs.length === 0 ? (
          <p className="text-sm text-stone-600">No hand-offs.</p>
        ) : (
          <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white text-sm">
            {results.handoffs.map((h) => (
              <li key={h.id} className="px-4 py-3">
                <span className="font-medium">{h.summary}</span> <span className="num text-stone-600">v{h.versionNumber}</span>{" "}
                <span className="rounded border border-stone-300 px-1.5 text-xs">{h.status === "open" ? "Open" : "Resolved"}</span>
                <span className="block text-stone-600">{formatDate(h.createdAt)}{h.ticketNumber ? ` · from ticket #${h.ticketNumber}` : ""}</span>
                {h.details ? <p className="mt-1 whitespace-pre-line">{h.details}</p> : null}
              </li>
            ))}
          </ul>
        )}
      </FieldSection>
    </>
  );
}
