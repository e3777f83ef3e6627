import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listFamilies } from "@/lib/families/get-family";

export const metadata = { title: "Families" };

export default async function FamiliesPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/families`);
  const families = await listFamilies({ vendorId: vendor.id });
  const actions = (
    <Link href={`/${slug}/drafting/families/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
      New family
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Families"
        lead="Sheets for a whole series of cutters × materials × machine classes, derived by the engine under your rules, reviewed and published as a batch."
        actions={actions}
      />
      {families.length === 0 ? (
        <EmptyState title="No families yet">
          Define a family to generate sheets for a cutter series across materials and machine classes.
        </EmptyState>
      ) : (
        <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white">
          {families.map((f) => (
            <li key={f.id} className="flex flex-wrap items-center gap-3 px-4 py-3 text-sm">
              <Link className="font-medium underline" href={`/${slug}/drafting/families/${f.slug}`}>
                {f.name}
              </Link>
              <span>
                rules version <span className="num">{f.ruleVersion}</span>
              </span>
              <span>
                <span className="num">{f.batches}</span> {f.batches === 1 ? "batch" : "batches"}
              </span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
