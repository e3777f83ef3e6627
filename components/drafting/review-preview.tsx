import "server-only";

import type { ReactNode } from "react";

import { ParameterDiffTable } from "@/components/drafting/parameter-diff-table";
import { ProseDiffView } from "@/components/drafting/prose-diff-view";
import type { Cutter } from "@/lib/catalogue/catalogue-types";
import type { UnitSystem } from "@/lib/machining";
import { splitFrontMatter } from "@/lib/mdx/split-front-matter";
import { checkDraftSource } from "@/lib/sheets/check-draft-source";
import { diffParameters } from "@/lib/sheets/parameter-diff";
import { diffProse } from "@/lib/sheets/prose-diff";
import type { SheetVersion } from "@/lib/sheets/sheet-types";

import { renderDraftPreview } from "./draft-preview";

const body = (source: string) => {
  const split = splitFrontMatter(source);
  return split.ok ? split.body : source;
};

/** What a reviewer approves: the version as customers will see it, and what changed since the version before it. */
export async function ReviewPreview({
  vendorId,
  draft,
  previous,
  cutter,
  refs,
  units,
}: {
  vendorId: string;
  draft: SheetVersion;
  previous: SheetVersion | null;
  cutter: Cutter;
  refs: { cutterId: string; materialId: string; machineClassId: string };
  units: UnitSystem;
}) {
  const check = await checkDraftSource({ vendorId, source: draft.source, expected: refs });
  let preview: ReactNode = null;
  try {
    preview = await renderDraftPreview({ check, source: draft.source, cutter, units });
  } catch {
    preview = null;
  }
  const geometry = { flutes: cutter.flutes, diameterMm: cutter.diameterMm };
  const diff = previous?.frontMatter && draft.frontMatter ? diffParameters(previous.frontMatter, draft.frontMatter, geometry) : null;
  const prose = previous ? diffProse(body(previous.source), body(draft.source)) : null;
  return (
    <div className="space-y-8" data-review>
      {previous ? (
        <section aria-labelledby="review-diff-h">
          <h2 id="review-diff-h" className="mb-2 text-lg font-semibold">
            What changed since version <span className="num">{previous.number}</span>
          </h2>
          {diff ? (
            <ParameterDiffTable diff={diff} units={units} />
          ) : (
            <p className="text-sm text-stone-600">The parameters of version {previous.number} could not be read.</p>
          )}
          <h3 className="mb-2 mt-4 font-semibold">Text</h3>
          {!prose || prose.lines.every((p) => !p.added && !p.removed) ? (
            <p className="text-sm text-stone-600">The text is unchanged.</p>
          ) : (
            <ProseDiffView parts={prose.words} />
          )}
        </section>
      ) : null}
      <section aria-labelledby="review-preview-h" className="rounded-md border border-stone-300 bg-white p-4">
        <h2 id="review-preview-h" className="mb-3 text-lg font-semibold">
          Version <span className="num">{draft.number}</span> as customers will see it
        </h2>
        {preview ?? (
          <p role="alert" className="text-sm text-red-800">
            This version does not validate; return it to draft and fix the problems the editor lists.
          </p>
        )}
      </section>
    </div>
  );
}
