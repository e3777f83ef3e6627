import { Suspense } from "react";

import { AdaptPanelSlot, OperationTable } from "@/components/mdx";
import { getCompiledSheet } from "@/components/mdx/render-sheet";
import type { SheetRenderContext } from "@/components/mdx/sheet-render-context";
import { AskAboutSheet } from "@/components/support/ask-about-sheet";
import type { UnitSystem } from "@/lib/machining";
import type { LibrarySheet } from "@/lib/sheets/find-library-sheet";

import { CutterCard } from "./cutter-card";
import { formatDate } from "./format-date";
import { MachineClassCard } from "./machine-class-card";
import { MaterialCard } from "./material-card";
import { SheetCautions } from "./sheet-cautions";
import { UnitsToggle } from "./units-toggle";
import { VersionBanner } from "./version-banner";
import { VersionHistory } from "./version-history";

type AdaptRenderer = SheetRenderContext["renderAdaptPanel"];

async function Prose({ data, units, renderAdaptPanel }: { data: LibrarySheet; units: UnitSystem; renderAdaptPanel?: AdaptRenderer }) {
  const cutter = { flutes: data.cutter.flutes, diameterMm: data.cutter.diameterMm };
  const { content } = await getCompiledSheet({ versionId: data.version.id, source: data.version.source, units, cutter, renderAdaptPanel });
  return (
    <div className="prose-sheet max-w-3xl leading-relaxed [&_h2]:mt-8 [&_h2]:text-lg [&_h2]:font-semibold [&_li]:my-1 [&_p]:my-3 [&_ul]:list-disc [&_ul]:pl-5">
      {content}
    </div>
  );
}

/** A readable sheet version laid out like a printed data sheet. */
export function SheetView({
  data,
  units,
  vendorSlug,
  vendorName,
  renderAdaptPanel,
}: {
  data: LibrarySheet;
  units: UnitSystem;
  vendorSlug: string;
  vendorName?: string;
  renderAdaptPanel?: AdaptRenderer;
}) {
  const { version, frontMatter, current } = data;
  const href = (n: number) => `/${vendorSlug}/library/${data.sheet.slug}/v/${n}`;
  const context = { frontMatter, units, cutter: { flutes: data.cutter.flutes, diameterMm: data.cutter.diameterMm }, renderAdaptPanel };
  const proseHasAdapt = /<AdaptPanel\b/.test(version.source);
  return (
    <article data-sheet={data.sheet.slug} data-version={version.number} className="print:text-[11pt]">
      <VersionBanner version={version} current={current} href={href} />
      <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b-2 border-stone-800 pb-4">
        <div>
          <p className="num text-xs uppercase tracking-wider text-stone-600">
            Recipe sheet · {data.sheet.slug} · version {version.number} · published {formatDate(version.publishedAt)}
          </p>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight">{version.title}</h1>
          <p className="mt-1 max-w-3xl text-stone-700">{frontMatter.summary}</p>
        </div>
        <div className="flex flex-wrap items-end gap-3">
          {version.state === "published" || version.state === "superseded" ? (
            <a
              href={`${href(version.number)}/pdf`}
              className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium hover:border-stone-500 print:hidden"
            >
              Data sheet (PDF)
            </a>
          ) : null}
          {vendorName ? <AskAboutSheet vendorSlug={vendorSlug} vendorName={vendorName} sheetVersionId={version.id} /> : null}
          <UnitsToggle units={units} />
        </div>
      </header>
      <div className="grid gap-4 md:grid-cols-3 print:grid-cols-3">
        <CutterCard cutter={data.cutter} units={units} vendorSlug={vendorSlug} />
        <MaterialCard material={data.material} units={units} />
        <MachineClassCard machineClass={data.machineClass} units={units} />
      </div>
      <section id="operations" aria-labelledby="operations-heading" className="mt-8">
        <h2 id="operations-heading" className="text-lg font-semibold">
          Operations
        </h2>
        <OperationTable context={context} />
      </section>
      <SheetCautions cautions={frontMatter.cautions} />
      {/* Mount point for the interactive adapt panel (Bench), unless the prose places it itself. */}
      {proseHasAdapt ? null : <AdaptPanelSlot operation="0" context={context} />}
      <section id="notes" className="mt-8">
        <Suspense fallback={<div className="h-24 animate-pulse rounded bg-stone-200/70" aria-label="Loading the notes" />}>
          <Prose data={data} units={units} renderAdaptPanel={renderAdaptPanel} />
        </Suspense>
      </section>
      <VersionHistory history={data.history} shown={version.number} href={href} />
    </article>
  );
}
