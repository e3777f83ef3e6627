import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";

import { DateRangeForm } from "@/components/field/date-range-form";
import { FieldSection } from "@/components/field/field-section";
import { SectionSkeleton } from "@/components/field/section-skeleton";
import { SheetActivitySections } from "@/components/field/sheet-activity-sections";
import { SheetTrendsSection } from "@/components/field/sheet-trends-section";
import { SheetVersionsSection } from "@/components/field/sheet-versions-section";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/permissions";
import { confidenceOf } from "@/lib/field/confidence";
import { findFieldSheetPage } from "@/lib/field/page-data";
import { readTrendRange } from "@/lib/field/read-filters";

import { startDraftFromChangeAction } from "../actions";

export const metadata = { title: "Field results for a sheet" };

type Props = { params: Promise<{ vendor: string; slug: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function FieldSheetPage({ params, searchParams }: Props) {
  const { vendor: slug, slug: sheetSlug } = await params;
  const found = await findFieldSheetPage(slug, sheetSlug);
  if (!found) notFound();
  const { access, sheet } = found;
  const vendorId = access.vendor.id;
  const { z, label } = confidenceOf(access.vendor.settings);
  const { range, chosen, error } = readTrendRange(await searchParams, new Date());
  const role = access.member?.role;
  const deskLinks = role ? can(role, "desk.use") : false;
  const canDraft = role ? can(role, "sheets.author") : false;
  const here = `/${slug}/drafting/field/${sheet.slug}`;
  return (
    <>
      <PageHeader
        title={sheet.title}
        lead={
          <>
            For the {sheet.machineClass} class; field results version by version.{" "}
            <Link className="underline" href={`/${slug}/drafting/sheets/${sheet.slug}`}>
              Open the sheet in Drafting
            </Link>{" "}
            ·{" "}
            <Link className="underline" href={`/${slug}/drafting/field`}>
              All Field results
            </Link>
          </>
        }
      />
      <Suspense fallback={<SectionSkeleton label="the versions' results" rows={5} />}>
        <SheetVersionsSection vendorSlug={slug} vendorId={vendorId} sheet={sheet} z={z} confidenceLabel={label} />
      </Suspense>
      <FieldSection
        id="sheet-trends"
        title="Trends"
        lead={
          <>
            Outcome reports and the share that failed, week by week (weeks start on Monday, UTC), all versions together; a dashed line marks
            the week a version was published. Whether failures fell after a new version is said only once the {label} intervals of the two
            versions no longer overlap.
          </>
        }
      >
        <DateRangeForm action={here} label="Trend date range" from={chosen.from ?? range.from} to={chosen.to ?? range.to} error={error} />
        <Suspense key={`${range.from}:${range.to}`} fallback={<SectionSkeleton label="the trends" rows={6} />}>
          <SheetTrendsSection
            vendorSlug={slug}
            vendorId={vendorId}
            sheetSlug={sheet.slug}
            sheetId={sheet.id}
            from={range.from}
            to={range.to}
            z={z}
            confidenceLabel={label}
          />
        </Suspense>
      </FieldSection>
      <Suspense fallback={<SectionSkeleton label="changes, tickets and hand-offs" />}>
        <SheetActivitySections
          vendorSlug={slug}
          vendorId={vendorId}
          sheetId={sheet.id}
          z={z}
          deskLinks={deskLinks}
          startDraft={canDraft ? startDraftFromChangeAction : undefined}
        />
      </Suspense>
    </>
  );
}
