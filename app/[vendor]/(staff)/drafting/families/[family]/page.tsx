import { notFound } from "next/navigation";

import { ActionForm } from "@/components/drafting/action-form";
import { BatchList } from "@/components/families/batch-list";
import { PreviewGrid } from "@/components/families/preview-grid";
import { PreviewSummary } from "@/components/families/preview-summary";
import { RulesForm } from "@/components/families/rules-form";
import { PageHeader } from "@/components/ui/page-header";
import { familyRulesToText } from "@/content-schema/family";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listBatches } from "@/lib/families/get-batch";
import { getLatestRuleSet } from "@/lib/families/get-family";
import { findDraftingFamily } from "@/lib/families/page-data";
import { countStatuses, PREVIEW_PAGE, previewFamily } from "@/lib/families/preview-family";

import { generateAction, saveRulesAction } from "../actions";

type Props = { params: Promise<{ vendor: string; family: string }>; searchParams: Promise<{ from?: string }> };

export async function generateMetadata({ params }: Props) {
  const { vendor, family } = await params;
  return { title: (await findDraftingFamily(vendor, family))?.name ?? "Family" };
}

const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const box = "rounded-md border border-stone-300 bg-white p-4";

export default async function FamilyPage({ params, searchParams }: Props) {
  const { vendor: vendorSlug, family: slug } = await params;
  const { vendor } = await requirePageAccess(vendorSlug, "sheets.author", `/${vendorSlug}/drafting/families/${slug}`);
  const family = await findDraftingFamily(vendorSlug, slug);
  if (!family) notFound();
  const from = Math.max(0, Math.floor(Number((await searchParams).from ?? 0)) || 0);
  const ruleSet = await getLatestRuleSet({ vendorId: vendor.id, familyId: family.id });
  const [preview, batches] = await Promise.all([
    previewFamily({ vendorId: vendor.id, slug: family.slug, rules: ruleSet.rules, offset: from, limit: PREVIEW_PAGE }),
    listBatches({ vendorId: vendor.id, familyId: family.id }),
  ]);
  const base = `/${vendor.slug}/drafting/families/${family.slug}`;
  const { cutters, materials, machineClasses } = preview.catalogue;
  return (
    <>
      <PageHeader
        title={family.name}
        lead={`${count(cutters.length, "cutter")} × ${count(materials.length, "material")} × ${count(machineClasses.length, "machine class", "machine classes")} = ${count(preview.total, "sheet")}; rules version ${ruleSet.number}.`}
      />
      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="rules-heading" className={box}>
          <h2 id="rules-heading" className="mb-2 text-lg font-semibold">
            Rules
          </h2>
          {/* A new rules version starts a fresh form: what an earlier refused try sent does not come back. */}
          <RulesForm
            key={ruleSet.number}
            action={saveRulesAction}
            vendorSlug={vendor.slug}
            family={family.slug}
            text={familyRulesToText(ruleSet.rules)}
            version={ruleSet.number}
          />
        </section>
        <section aria-labelledby="generate-heading" className={box}>
          <h2 id="generate-heading" className="mb-2 text-lg font-semibold">
            Generate
          </h2>
          <p className="mb-3 text-sm text-stone-600">
            Writes a draft for every cell of the preview under rules version {ruleSet.number}, in the background. Cells the engine warns
            about are not written; sheets whose numbers would not change get no new version. A second engineer then reviews the batch.
          </p>
          <ActionForm
            action={generateAction}
            hidden={{ vendor: vendor.slug, family: family.slug }}
            submitLabel={`Generate with rules version ${ruleSet.number}`}
          />
          <h3 className="mt-4 mb-2 font-semibold">Batches</h3>
          <BatchList batches={batches} base={base} />
        </section>
      </div>
      <section aria-labelledby="preview-heading" className="mt-8 flex flex-col gap-3">
        <h2 id="preview-heading" className="text-lg font-semibold">
          Preview under rules version {ruleSet.number}
        </h2>
        <PreviewSummary counts={countStatuses(preview.cells)} shown={preview.cells.length} total={preview.total} />
        <PreviewGrid cells={preview.cells} vendorSlug={vendor.slug} />
        <nav aria-label="Preview pages" className="flex gap-3 text-sm">
          {from > 0 ? (
            <a className="underline" href={`${base}?from=${Math.max(0, from - PREVIEW_PAGE)}`}>
              Previous cells
            </a>
          ) : null}
          {from + preview.cells.length < preview.total ? (
            <a className="underline" href={`${base}?from=${from + PREVIEW_PAGE}`}>
              Next cells
            </a>
          ) : null}
        </nav>
      </section>
    </>
  );
}
