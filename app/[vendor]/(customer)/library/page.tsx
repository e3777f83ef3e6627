import Link from "next/link";

import { CachedLibraryIndex } from "@/components/library/cached-library-index";
import { LibraryIndex } from "@/components/library/library-index";
import { readUnits } from "@/components/library/read-units";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { libraryCacheDb } from "@/lib/library/library-cache";
import { readLibraryGeneration } from "@/lib/library/library-generation";
import { noteStoredRender } from "@/lib/library/note-stored-render";
import { findShopFilter } from "@/lib/my-cutters/list-shop-sheets";

export const metadata = { title: "Library" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };
const one = (v: string | string[] | undefined) => (typeof v === "string" && v.trim() && v.length <= 80 ? v.trim() : undefined);

export default async function LibraryPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const { vendor, user, member } = await requirePageAccess(slug, "library.read", `/${slug}/library`);
  const q = await searchParams;
  // "Fits my shop": my cutters × the machine classes that fit my machines (signed-in people with a Bench only).
  const keeper = user && member && can(member.role, "bench.use") ? user : null;
  const shop = keeper && q.shop === "mine" ? await findShopFilter({ vendorId: vendor.id, userId: keeper.id }) : null;
  const filters = { cutter: one(q.cutter), material: one(q.material), machineClass: one(q.machineClass) };
  const [units, generation] = await Promise.all([readUnits(), readLibraryGeneration(vendor.id, libraryCacheDb)]);
  // The Library page store (lib/library/page-store-proxy.ts) keeps the anonymous index without filters.
  await noteStoredRender({ vendorId: vendor.id, versionId: null });
  const shopHint =
    shop && (!shop.cutters || !shop.machines) ? (
      <p className="mb-3 text-sm text-stone-700">
        &quot;Fits my shop&quot; needs {!shop.cutters ? "your cutters" : "a registered machine"}: add {!shop.cutters ? "them" : "one"} on
        your{" "}
        <Link className="underline" href={`/${vendor.slug}/bench`}>
          Bench
        </Link>
        .
      </p>
    ) : null;
  return (
    <>
      <PageHeader
        title="Library"
        lead={`Published recipe sheets from ${vendor.name}: starting-point cutting data per cutter, material and machine class.`}
        actions={
          <Link
            href={`/${vendor.slug}/library/search`}
            className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium hover:border-stone-500"
          >
            Search sheets
          </Link>
        }
      />
      {shop ? (
        <>
          {shopHint}
          <LibraryIndex
            vendorId={vendor.id}
            vendorSlug={vendor.slug}
            filters={{ ...filters, cutterIds: shop.cutterIds, machineClassIds: shop.machineClassIds }}
            units={units}
            shop={true}
          />
        </>
      ) : (
        <CachedLibraryIndex
          generation={generation}
          vendorId={vendor.id}
          vendorSlug={vendor.slug}
          filters={filters}
          units={units}
          shop={keeper ? false : null}
        />
      )}
    </>
  );
}
