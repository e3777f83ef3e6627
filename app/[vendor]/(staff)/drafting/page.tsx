import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { countDraftingOverview } from "@/lib/sheets/count-drafting-overview";

export const metadata = { title: "Drafting" };

const STATE_LABELS: Record<string, string> = { draft: "Drafts", in_review: "In review", published: "Published", superseded: "Superseded", withdrawn: "Withdrawn" };

export default async function DraftingPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting`);
  const overview = await countDraftingOverview({ vendorId: vendor.id });
  const tiles = [
    ["Cutters", overview.cutters],
    ["Materials", overview.materials],
    ["Machine classes", overview.machineClasses],
    ...Object.entries(STATE_LABELS).map(([state, label]) => [label, overview.versionsByState[state] ?? 0] as const),
  ] as const;
  return (
    <>
      <PageHeader title="Drafting" lead="Author, review and publish recipe sheets; keep the catalogue of cutters, materials and machine classes." />
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {tiles.map(([label, value]) => (
          <div key={label} className="rounded-lg border border-stone-200 bg-white p-4">
            <dt className="text-sm text-stone-600">{label}</dt>
            <dd className="num mt-1 text-2xl font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
    </>
  );
}
