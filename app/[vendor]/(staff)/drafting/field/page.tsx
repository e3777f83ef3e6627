import { CoverageGapList } from "@/components/field/coverage-gap-list";
import { CustomerChangesList } from "@/components/field/customer-changes-list";
import { DigestControls } from "@/components/field/digest-controls";
import { FieldSection } from "@/components/field/field-section";
import { NeedsAttentionTable } from "@/components/field/needs-attention-table";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { confidenceOf, percent } from "@/lib/field/confidence";
import { loadCoverageGaps } from "@/lib/field/coverage";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { loadFieldSummary } from "@/lib/field/field-summary";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { lastFieldRefresh } from "@/lib/field/refresh-rollups";
import { wilsonInterval } from "@/lib/field/wilson";
import { formatDateTime } from "@/lib/ui/dates";

export const metadata = { title: "Field results" };


export default async function FieldResultsPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor, user } = await requirePageAccess(slug, "field.read", `/${slug}/drafting/field`);
  const { z, label } = confidenceOf(vendor.settings);
  // The explanation uses the vendor's own level, so it stays true at 80 % as at 99 %.
  const oneInOne = wilsonInterval(1, 1, z).lower;
  const thirtyInHundred = wilsonInterval(30, 100, z).lower;
  const [summary, attention, changes, coverage, refreshed, digestOn] = await Promise.all([
    loadFieldSummary({ vendorId: vendor.id }),
    listNeedsAttention({ vendorId: vendor.id, z }),
    listCustomerChanges({ vendorId: vendor.id }),
    loadCoverageGaps({ vendorId: vendor.id }),
    lastFieldRefresh(),
    wantsMail(undefined, { vendorId: vendor.id, userId: user!.id, kind: "weekly_digest" }),
  ]);
  const csv = (list: string) => `/api/v1/vendors/${slug}/field/${list}`;
  const tiles = [
    ["Outcome reports", summary.outcomes],
    ["Failed", summary.outcomes ? `${summary.failed} (${percent(summary.failed / summary.outcomes)})` : 0],
    ["Setups saved", summary.setups],
    ["Adaptations", summary.adaptations],
    ["Library views", summary.views],
    ["Open hand-offs", summary.openHandoffs],
  ] as const;
  return (
    <>
      <PageHeader
        title="Field results"
        lead={<>How your published numbers fare in customers’ shops: outcome reports, setups and tickets, per sheet version. Aggregates only; no customer is named. Figures as of {refreshed ? formatDateTime(refreshed) : "the next refresh"}; they refresh every few minutes.</>}
      />
      <DigestControls vendorSlug={slug} enabled={digestOn} />
      <dl className="mt-6 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
        {tiles.map(([name, value]) => (
          <div key={name} className="rounded-lg border border-stone-200 bg-white p-4">
            <dt className="text-sm text-stone-600">{name}</dt>
            <dd className="num mt-1 text-xl font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      <FieldSection
        id="needs-attention"
        title="Needs attention"
        csvHref={csv("needs-attention")}
        lead={<>Published versions ranked by the <strong>lower end</strong> of the {label} Wilson score interval of their failure share, which weighs how many reports there are: at {label}, 1 failure in 1 report has a lower end of {percent(oneInOne)} and 30 failures in 100 of {percent(thirtyInHundred)}. The bar shows the interval and the dot the observed share. The confidence level is a vendor setting (Admin).</>}
      >
        <NeedsAttentionTable items={attention} vendorSlug={slug} confidenceLabel={label} />
      </FieldSection>
      <FieldSection
        id="customer-changes"
        title="What customers changed"
        csvHref={csv("customer-changes")}
        lead="From “worked after changes” reports: which number customers changed and by how much. Suggestions for the next version of the sheet; nothing changes until an engineer drafts, reviews and publishes it."
      >
        <CustomerChangesList items={changes} vendorSlug={slug} />
      </FieldSection>
      <FieldSection
        id="coverage-gaps"
        title="Coverage gaps"
        csvHref={csv("coverage-gaps")}
        lead="Customers’ registered machines whose spindle speed, power or rigidity fall outside every machine class you publish sheets for, grouped by top speed, power and frame. A class covers a machine whose top speed is 75–150 % of the class’s, whose lowest speed is at most 1.5 times the class’s, with half to twice its power and a rigidity within ±0.2."
      >
        <CoverageGapList report={coverage} vendorSlug={slug} />
      </FieldSection>
    </>
  );
}
