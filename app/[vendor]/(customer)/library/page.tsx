import Link from "next/link";

import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";

export const metadata = { title: "Library" };

export default async function LibraryPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "library.read", `/${slug}/library`);
  const sheets = await listPublishedSheets({ vendorId: vendor.id });
  return (
    <>
      <PageHeader title="Library" lead={`Published recipe sheets from ${vendor.name}: starting-point cutting data per cutter, material and machine class.`} />
      {sheets.length === 0 ? (
        <p className="rounded-lg border border-dashed border-stone-300 p-8 text-center text-stone-600">No sheets are published yet.</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {sheets.map((sheet) => (
            <li key={sheet.slug} className="rounded-lg border border-stone-200 bg-white p-4 shadow-sm">
              <Link href={`/${vendor.slug}/library/${sheet.slug}`} className="font-medium hover:underline">
                {sheet.title}
              </Link>
              <p className="mt-1 text-sm text-stone-600">
                <span className="num">{sheet.cutterSku}</span> · Ø <span className="num">{sheet.diameterMm} mm</span> ·{" "}
                <span className="num">{sheet.flutes}</span> {sheet.flutes === 1 ? "flute" : "flutes"} · {sheet.materialName} · {sheet.machineClassName}
              </p>
              <p className="mt-1 text-xs text-stone-500">Version {sheet.number}</p>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
