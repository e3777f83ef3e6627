import Link from "next/link";
import { notFound } from "next/navigation";

import { saveSetupAction } from "@/app/[vendor]/(customer)/bench/actions";
import { AdaptPanelMount } from "@/components/adapt/adapt-panel-mount";
import { readUnits } from "@/components/library/read-units";
import { PageHeader } from "@/components/ui/page-header";
import { readaptStart } from "@/lib/adapt/readapt-start";
import { findBenchVersion } from "@/lib/bench/page-data";

export const metadata = { title: "Adapt a sheet" };

// The adapt panel on its own page: reached from "re-adapt to the current version" on a setup.
type Props = {
  params: Promise<{ vendor: string; versionId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
};

export default async function AdaptVersionPage({ params, searchParams }: Props) {
  const { vendor: slug, versionId } = await params;
  const found = await findBenchVersion(slug, versionId);
  if (!found) notFound();
  const { vendor, user, context } = found;
  const setupParam = (await searchParams).setup;
  const start = await readaptStart({
    vendorId: vendor.id,
    userId: user.id,
    setupId: typeof setupParam === "string" ? setupParam : undefined,
    versionId: context.versionId,
  });
  const href = `/${vendor.slug}/library/${context.sheetSlug}/v/${context.versionNumber}`;
  return (
    <>
      <PageHeader
        title={`Adapt: ${context.title}`}
        lead={
          <>
            Version {context.versionNumber} ·{" "}
            <Link className="underline" href={href}>
              read the sheet
            </Link>
          </>
        }
      />
      <section id="adapt" aria-label="Adapt to your machine" className="rounded-md border border-stone-300 bg-white p-4">
        <AdaptPanelMount
          saveSetupAction={saveSetupAction}
          vendor={vendor}
          versionId={context.versionId}
          operationIndex={start?.operationIndex ?? 0}
          units={await readUnits()}
          returnTo={`/${vendor.slug}/bench/adapt/${versionId}`}
          start={start ?? undefined}
        />
      </section>
    </>
  );
}
