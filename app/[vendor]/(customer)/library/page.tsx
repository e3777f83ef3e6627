import Link from "next/link";

import { CachedLibraryIndex } from "@/components/library/cached-library-index";
import { readUnits } from "@/components/library/read-units";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

export const metadata = { title: "Library" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };
const one = (v: string | string[] | undefined) => (typeof v === "string" && v.trim() && v.length <= 80 ? v.trim() : undefined);

export default async function LibraryPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "library.read", `/${slug}/library`);
  const q = await searchParams;
  const filters = { cutter: one(q.cutter), material: one(q.material), machineClass: one(q.machineClass) };
  return (
    <>
      <PageHeader title="Library" lead={`Published recipe sheets from ${vendor.name}: starting-point cutting data per cutter, material and machine class.`} actions={<Link href={`/${vendor.slug}/library/search`} className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium hover:border-stone-500">Search sheets</Link>} />
      <CachedLibraryIndex vendorId={vendor.id} vendorSlug={vendor.slug} filters={filters} units={await readUnits()} />
    </>
  );
}
