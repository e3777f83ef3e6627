import "server-only";

import type { ReactNode } from "react";

import { SheetCautions } from "@/components/library/sheet-cautions";
import { OperationTable } from "@/components/mdx";
import { compileSheet } from "@/components/mdx/render-sheet";
import type { Cutter } from "@/lib/catalogue/catalogue-types";
import type { UnitSystem } from "@/lib/machining";
import type { DraftCheck } from "@/lib/sheets/check-draft-source";

/** The draft rendered by the same pipeline and components as the Library page; null while it does not validate. */
export async function renderDraftPreview({
  check,
  source,
  cutter,
  units,
}: {
  check: DraftCheck;
  source: string;
  cutter: Cutter;
  units: UnitSystem;
}): Promise<ReactNode> {
  if (!check.frontMatter || check.issues.some((i) => i.severity === "error")) return null;
  const geometry = { flutes: cutter.flutes, diameterMm: cutter.diameterMm };
  const { content, frontMatter } = await compileSheet({ source, units, cutter: geometry });
  return (
    <article data-preview className="text-stone-900">
      <h1 className="text-xl font-semibold">{frontMatter.title}</h1>
      <p className="text-stone-700">{frontMatter.summary}</p>
      <OperationTable context={{ frontMatter, units, cutter: geometry }} />
      <SheetCautions cautions={frontMatter.cautions} />
      <div className="mt-6 leading-relaxed [&_h2]:mt-6 [&_h2]:text-lg [&_h2]:font-semibold [&_p]:my-3 [&_ul]:list-disc [&_ul]:pl-5">
        {content}
      </div>
    </article>
  );
}
