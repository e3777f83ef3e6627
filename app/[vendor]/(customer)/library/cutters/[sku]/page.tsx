import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { CachedCutterSheets } from "@/components/library/cached-library-cutter";
import { findLibraryCutterPage } from "@/components/library/find-library-cutter-page";
import { MyCutterButton } from "@/components/library/my-cutter-button";
import { readUnits } from "@/components/library/read-units";
import { UnitsToggle } from "@/components/library/units-toggle";
import { PageHeader } from "@/components/ui/page-header";
import { can } from "@/lib/auth/permissions";
import { noteStoredRender } from "@/lib/library/note-stored-render";
import { hasMyCutter } from "@/lib/my-cutters/my-cutters";

import { addMyCutterAction, removeMyCutterAction } from "../../../bench/actions";

type Props = { params: Promise<{ vendor: string; sku: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { vendor, sku } = await params;
  return { title: (await findLibraryCutterPage(vendor, sku))?.cutter.sku ?? "Cutter" };
}

// The deep-link target of a cutter's short link and QR code: the cutter and its published sheets.
export default async function CutterPage({ params }: Props) {
  const { vendor: vendorSlug, sku } = await params;
  const found = await findLibraryCutterPage(vendorSlug, sku);
  if (!found) notFound();
  const { vendor, cutter, user, member } = found;
  const keeper = user && member && can(member.role, "bench.use") ? user : null;
  const [units, mine] = await Promise.all([
    readUnits(),
    keeper ? hasMyCutter({ vendorId: vendor.id, userId: keeper.id, cutterId: cutter.id }) : false,
  ]);
  // The Library page store (lib/library/page-store-proxy.ts) keeps the anonymous page.
  await noteStoredRender({ vendorId: vendor.id, versionId: null });
  const state = !user ? "signed-out" : !keeper ? "not-member" : mine ? "mine" : "not-mine";
  return (
    <>
      <PageHeader
        title={`${cutter.sku}: ${cutter.name}`}
        lead="Published recipe sheets for this cutter."
        actions={
          <>
            <a
              href={`/${vendor.slug}/library/cutters/${encodeURIComponent(cutter.sku)}/pdf`}
              className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium hover:border-stone-500 print:hidden"
            >
              Cutter data sheet (PDF)
            </a>
            <UnitsToggle units={units} />
          </>
        }
      />
      <div className="mb-4 max-w-xl print:hidden">
        <MyCutterButton
          vendorSlug={vendor.slug}
          sku={cutter.sku}
          cutterId={cutter.id}
          state={state}
          addMyCutterAction={addMyCutterAction}
          removeMyCutterAction={removeMyCutterAction}
        />
      </div>
      <CachedCutterSheets vendorId={vendor.id} vendorSlug={vendor.slug} sku={cutter.sku} generation={found.generation} units={units} />
    </>
  );
}
