import { Suspense } from "react";

import { AttentionSection } from "@/components/field/attention-section";
import { ChangesSection } from "@/components/field/changes-section";
import { CoverageSection } from "@/components/field/coverage-section";
import { DateRangeForm } from "@/components/field/date-range-form";
import { DigestControls } from "@/components/field/digest-controls";
import { FieldSection } from "@/components/field/field-section";
import { RefreshedAt } from "@/components/field/refreshed-at";
import { SectionSkeleton } from "@/components/field/section-skeleton";
import { SummaryTiles } from "@/components/field/summary-tiles";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { listMachineClasses } from "@/lib/catalogue/list-catalogue";
import { confidenceOf, percent } from "@/lib/field/confidence";
import { readAttentionFilter } from "@/lib/field/read-filters";
import { wilsonInterval } from "@/lib/field/wilson";
import { wantsMail } from "@/lib/mail-preferences/mail-preferences";

import { sendDigestNowAction, setWeeklyDigestAction, startDraftFromChangeAction } from "./actions";

export const metadata = { title: "Field results" };

// The list's filters, carried to its CSV export so the file holds what the page shows.
const attentionQuery = (f: { from?: string; to?: string; class?: string }) => {
  const query = new URLSearchParams(
    Object.entries(f).filter((e): e is [string, string] => typeof e[1] === "string" && e[1] !== ""),
  ).toString();
  return query ? `?${query}` : "";
};

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function FieldResultsPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const { vendor, user, member } = await requirePageAccess(slug, "field.read", `/${slug}/drafting/field`);
  const { z, label } = confidenceOf(vendor.settings);
  const { filter, error } = readAttentionFilter(await searchParams);
  // The explanation uses the vendor's own level, so it stays true at 80 % as at 99 %.
  const oneInOne = wilsonInterval(1, 1, z).lower;
  const thirtyInHundred = wilsonInterval(30, 100, z).lower;
  const [digestOn, classes] = await Promise.all([
    wantsMail(undefined, { vendorId: vendor.id, userId: user!.id, kind: "weekly_digest" }),
    listMachineClasses({ vendorId: vendor.id }),
  ]);
  const unknownClass =
    filter.class && !classes.some((c) => c.slug === filter.class) ? "No machine class of that name; showing every class." : null;
  const shown = unknownClass ? { ...filter, class: undefined } : filter;
  const canDraft = member ? can(member.role, "sheets.author") : false;
  const csv = (list: string) => `/api/v1/vendors/${slug}/field/${list}`;
  return (
    <>
      <PageHeader
        title="Field results"
        lead={
          <>
            How your published numbers fare in customers’ shops: outcome reports, setups and tickets, per sheet version. Aggregates only; no
            customer is named. Figures as of{" "}
            <Suspense fallback="the latest refresh">
              <RefreshedAt />
            </Suspense>
            ; they refresh every few minutes.
          </>
        }
      />
      <DigestControls
        sendDigestNowAction={sendDigestNowAction}
        setWeeklyDigestAction={setWeeklyDigestAction}
        vendorSlug={slug}
        enabled={digestOn}
      />
      <Suspense fallback={<SectionSkeleton label="the totals" rows={2} />}>
        <SummaryTiles vendorId={vendor.id} />
      </Suspense>
      <FieldSection
        id="needs-attention"
        title="Needs attention"
        csvHref={`${csv("needs-attention")}${attentionQuery(shown)}`}
        lead={
          <>
            Published versions ranked by the <strong>lower end</strong> of the {label} Wilson score interval of their failure share, which
            weighs how many reports there are: at {label}, 1 failure in 1 report has a lower end of {percent(oneInOne)} and 30 failures in
            100 of {percent(thirtyInHundred)}. The bar shows the interval and the dot the observed share. The confidence level is a vendor
            setting (Admin). A date range counts the reports of the whole weeks (Monday to Sunday, UTC) it touches; tickets and hand-offs
            are always counted in full.
          </>
        }
      >
        <DateRangeForm
          action={`/${slug}/drafting/field`}
          label="Filter Needs attention"
          from={shown.from}
          to={shown.to}
          error={error ?? unknownClass}
        >
          <label className="flex flex-col">
            <span>Machine class</span>
            <select name="class" defaultValue={shown.class ?? ""} className="min-h-11 rounded border border-stone-300 bg-white px-2">
              <option value="">Every class</option>
              {classes.map((c) => (
                <option key={c.slug} value={c.slug}>
                  {c.name}
                </option>
              ))}
            </select>
          </label>
        </DateRangeForm>
        <Suspense key={`${shown.from}:${shown.to}:${shown.class}`} fallback={<SectionSkeleton label="Needs attention" rows={6} />}>
          <AttentionSection vendorId={vendor.id} vendorSlug={slug} z={z} confidenceLabel={label} filter={shown} />
        </Suspense>
      </FieldSection>
      <FieldSection
        id="customer-changes"
        title="What customers changed"
        csvHref={csv("customer-changes")}
        lead="From “worked after changes” reports: which number of which operation customers changed and by how much. Suggestions for the next version of the sheet; nothing changes until an engineer drafts, reviews and publishes it. “Start a draft from this” opens a draft with the median change applied, for you to check and send to review."
      >
        <Suspense fallback={<SectionSkeleton label="What customers changed" />}>
          <ChangesSection vendorId={vendor.id} vendorSlug={slug} startDraft={canDraft ? startDraftFromChangeAction : undefined} />
        </Suspense>
      </FieldSection>
      <FieldSection
        id="coverage-gaps"
        title="Coverage gaps"
        csvHref={csv("coverage-gaps")}
        lead="Customers’ registered machines whose spindle speed, power or rigidity fall outside every machine class you publish sheets for, grouped by top speed, power and frame. A class covers a machine whose top speed is 75–150 % of the class’s, whose lowest speed is at most 1.5 times the class’s, with half to twice its power and a rigidity within ±0.2."
      >
        <Suspense fallback={<SectionSkeleton label="Coverage gaps" />}>
          <CoverageSection vendorId={vendor.id} vendorSlug={slug} />
        </Suspense>
      </FieldSection>
    </>
  );
}
