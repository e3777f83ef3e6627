import Link from "next/link";

import { LibraryFilters } from "@/components/library/library-filters";
import { readUnits } from "@/components/library/read-units";
import { SheetCards } from "@/components/library/sheet-cards";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { can } from "@/lib/auth/permissions";
import { listCutters, listMachineClasses, listMaterials } from "@/lib/catalogue/list-catalogue";
import { findShopFilter } from "@/lib/my-cutters/list-shop-sheets";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";

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
  const filters = { cutter: one(q.cutter), material: one(q.material), machineClass: one(q.machineClass), ...(shop ? { cutterIds: shop.cutterIds, machineClassIds: shop.machineClassIds } : {}) };
  const [sheets, cutters, materials, machineClasses, units] = await Promise.all([
    listPublishedSheets({ vendorId: vendor.id, filters }),
    listCutters({ vendorId: vendor.id }),
    listMaterials({ vendorId: vendor.id }),
    listMachineClasses({ vendorId: vendor.id }),
    readUnits(),
  ]);
  const filtered = Boolean(filters.cutter || filters.material || filters.machineClass || shop);
  const shopHint = shop && (!shop.cutters || !shop.machines) ? (
    <p className="mb-3 text-sm text-stone-700">
      &quot;Fits my shop&quot; needs {!shop.cutters ? "your cutters" : "a registered machine"}: add {!shop.cutters ? "them" : "one"} on your <Link className="underline" href={`/${vendor.slug}/bench`}>Bench</Link>.
    </p>
  ) : null;
  return (
    <>
      <PageHeader title="Library" lead={`Published recipe sheets from ${vendor.name}: starting-point cutting data per cutter, material and machine class.`} actions={<Link href={`/${vendor.slug}/library/search`} className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium hover:border-stone-500">Search sheets</Link>} />
      <LibraryFilters action={`/${vendor.slug}/library`} filters={filters} cutters={cutters} materials={materials} machineClasses={machineClasses} shop={keeper ? Boolean(shop) : null} />
      {shopHint}
      <p className="mb-3 text-sm text-stone-600" role="status"><span className="num">{sheets.length}</span> {sheets.length === 1 ? "sheet" : "sheets"}</p>
      <SheetCards sheets={sheets} vendorSlug={vendor.slug} units={units} empty={filtered ? "No sheet matches these filters." : "No sheets are published yet."} />
    </>
  );
}
