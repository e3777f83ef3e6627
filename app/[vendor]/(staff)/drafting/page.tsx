import Link from "next/link";

import { StateBadge } from "@/components/drafting/state-badge";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { countDraftingOverview } from "@/lib/sheets/count-drafting-overview";
import { listDraftingSheets } from "@/lib/sheets/list-drafting-sheets";

export const metadata = { title: "Drafting" };

const STATE_LABELS: Record<string, string> = {
  draft: "Drafts",
  in_review: "In review",
  published: "Published",
  superseded: "Superseded",
  withdrawn: "Withdrawn",
};

export default async function DraftingPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting`);
  const [overview, sheets] = await Promise.all([
    countDraftingOverview({ vendorId: vendor.id }),
    listDraftingSheets({ vendorId: vendor.id }),
  ]);
  const open = sheets.filter((s) => s.latestState === "draft" || s.latestState === "in_review");
  const tiles = [
    ["Cutters", overview.cutters, "cutters"],
    ["Materials", overview.materials, "materials"],
    ["Machine classes", overview.machineClasses, "machine-classes"],
    ...Object.entries(STATE_LABELS).map(([state, label]) => [label, overview.versionsByState[state] ?? 0, "sheets"] as const),
  ] as const;
  const actions = (
    <Link href={`/${slug}/drafting/sheets/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
      New sheet
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Drafting"
        lead="Author, review and publish recipe sheets; keep the catalogue of cutters, materials and machine classes."
        actions={actions}
      />
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {tiles.map(([label, value, href]) => (
          <div key={label} className="rounded-lg border border-stone-200 bg-white p-4">
            <dt className="text-sm text-stone-600">
              <Link className="hover:underline" href={`/${slug}/drafting/${href}`}>
                {label}
              </Link>
            </dt>
            <dd className="num mt-1 text-2xl font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      <section aria-labelledby="open-heading" className="mt-8">
        <h2 id="open-heading" className="mb-2 text-lg font-semibold">
          Open drafts and reviews
        </h2>
        {open.length === 0 ? (
          <p className="text-sm text-stone-600">Nothing open.</p>
        ) : (
          <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white">
            {open.map((s) => (
              <li key={s.slug} className="flex flex-wrap items-center gap-3 px-4 py-3 text-sm">
                <Link className="font-medium underline" href={`/${slug}/drafting/sheets/${s.slug}`}>
                  {s.title}
                </Link>
                <span className="num">v{s.latestNumber}</span>
                <StateBadge state={s.latestState} />
              </li>
            ))}
          </ul>
        )}
      </section>
    </>
  );
}
