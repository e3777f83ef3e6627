import { notFound } from "next/navigation";

import { ParameterDiffTable } from "@/components/drafting/parameter-diff-table";
import { ProseDiffView } from "@/components/drafting/prose-diff-view";
import { readUnits } from "@/components/library/read-units";
import { UnitsToggle } from "@/components/library/units-toggle";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { splitFrontMatter } from "@/lib/mdx/split-front-matter";
import { findDraftingSheetPage } from "@/lib/sheets/page-data";
import { diffParameters } from "@/lib/sheets/parameter-diff";
import { diffProse } from "@/lib/sheets/prose-diff";

type Props = { params: Promise<{ vendor: string; slug: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export const metadata = { title: "Compare versions" };

const num = (v: unknown) => (typeof v === "string" && /^\d{1,6}$/.test(v) ? Number(v) : undefined);
const body = (source: string) => {
  const split = splitFrontMatter(source);
  return split.ok ? split.body : source;
};

export default async function DiffPage({ params, searchParams }: Props) {
  const { vendor: vendorSlug, slug } = await params;
  await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/sheets/${slug}/diff`);
  const data = await findDraftingSheetPage(vendorSlug, slug);
  if (!data) notFound();
  const q = await searchParams;
  const byNumber = new Map(data.versions.map((v) => [v.number, v]));
  const to = byNumber.get(num(q.to) ?? data.versions[0].number);
  const from = byNumber.get(num(q.from) ?? (to ? to.number - 1 : 0));
  const units = await readUnits();
  const picker = (
    <form method="get" className="no-print flex flex-wrap items-end gap-2">
      {(["from", "to"] as const).map((name) => (
        <label key={name} className="flex flex-col gap-1 text-sm font-medium">
          {name === "from" ? "From" : "To"}
          <select
            name={name}
            defaultValue={(name === "from" ? from : to)?.number}
            className="min-h-11 rounded border border-stone-300 bg-white px-3"
          >
            {data.versions.map((v) => (
              <option key={v.number} value={v.number}>
                Version {v.number} ({v.state.replace("_", " ")})
              </option>
            ))}
          </select>
        </label>
      ))}
      <button type="submit" className="min-h-11 rounded border border-stone-300 bg-white px-4 font-medium">
        Compare
      </button>
      <UnitsToggle units={units} />
    </form>
  );
  if (!from || !to || !from.frontMatter || !to.frontMatter) {
    return (
      <>
        <PageHeader title="Compare versions" actions={picker} />
        <EmptyState title="Pick two versions whose sources validate." />
      </>
    );
  }
  const diff = diffParameters(from.frontMatter, to.frontMatter, { flutes: data.cutter.flutes, diameterMm: data.cutter.diameterMm });
  const prose = diffProse(body(from.source), body(to.source));
  return (
    <>
      <PageHeader
        title={`Version ${from.number} → version ${to.number}`}
        lead={to.changeNote ? `Change note: ${to.changeNote}` : undefined}
        actions={picker}
      />
      <h2 className="mb-2 text-lg font-semibold">Parameters</h2>
      <ParameterDiffTable diff={diff} units={units} />
      <h2 className="mb-2 mt-8 text-lg font-semibold">Text</h2>
      {prose.lines.every((p) => !p.added && !p.removed) ? (
        <p className="text-sm text-stone-600">The text is unchanged.</p>
      ) : (
        <ProseDiffView parts={prose.words} />
      )}
    </>
  );
}
