import Link from "next/link";
import { notFound } from "next/navigation";

import { EntryAdvice } from "@/components/adapt/entry-advice";
import { resultRows, ResultTable } from "@/components/adapt/result-table";
import { StepsTrail } from "@/components/adapt/steps-trail";
import { WarningList } from "@/components/adapt/warning-list";
import { FeedSpeedChart } from "@/components/bench/feed-speed-chart";
import { OutcomeForm } from "@/components/bench/outcome-form";
import { OutcomeHistory } from "@/components/bench/outcome-history";
import { ReadaptCompare } from "@/components/bench/readapt-compare";
import { AskAboutSheet } from "@/components/support/ask-about-sheet";
import { PageHeader } from "@/components/ui/page-header";
import { entryCapabilityLabels } from "@/content-schema/setup-fields";
import { findAdaptContext } from "@/lib/adapt/page-data";
import { readaptSetup } from "@/lib/adapt/readapt-setup";
import { feedSpeedCurve } from "@/lib/bench/feed-speed-curve";
import { machineToInput } from "@/lib/bench/machine-rows";
import { findMachine } from "@/lib/bench/machines";
import { listOutcomes } from "@/lib/bench/outcomes";
import { findBenchSetup } from "@/lib/bench/page-data";
import { setupSheetData } from "@/lib/bench/setup-sheet-data";
import { versionNumbers } from "@/lib/bench/version-numbers";
import { formatNumber } from "@/lib/machining";

export const metadata = { title: "Setup" };

export default async function SetupPage({ params }: { params: Promise<{ vendor: string; id: string }> }) {
  const { vendor: slug, id } = await params;
  const found = await findBenchSetup(slug, id);
  if (!found) notFound();
  const { vendor, user, setup } = found;
  const owner = { vendorId: vendor.id, userId: user.id };
  const [context, machine, outcomes] = await Promise.all([
    findAdaptContext(vendor.id, setup.sheetVersionId),
    findMachine({ ...owner, machineId: setup.machineId }),
    listOutcomes({ ...owner, setupId: setup.id }),
  ]);
  if (!context) notFound();
  const readapt = await readaptSetup({ ...owner, setup, oldContext: context });
  const numbers = await versionNumbers({ vendorId: vendor.id, versionIds: outcomes.map((o) => o.sheetVersionId) });
  const op = context.operations[setup.operationIndex];
  const units = setup.units;
  const r = setup.result;
  const curve = machine
    ? feedSpeedCurve({
        machine: machineToInput(machine),
        diameterMm: context.cutter.diameterMm,
        flutes: context.cutter.flutes,
        chipLoadMm: r.chipLoadMm,
        minChipLoadMm: context.material.minChipLoadMm,
        vcWindowMpm: [context.material.vcMinMpm, context.material.vcMaxMpm],
        adapted: r,
        units,
      })
    : null;
  const current = {
    rpm: formatNumber(r.rpm, "spindleSpeed", units),
    feedMmMin: formatNumber(r.feedMmMin, "feedRate", units),
    axialDepthMm: formatNumber(r.axialDepthMm, "length", units),
    radialDepthMm: formatNumber(r.radialDepthMm, "length", units),
    plungeFeedMmMin: r.plungeFeedMmMin === null ? "" : formatNumber(r.plungeFeedMmMin, "feedRate", units),
  };
  const sheetData = setupSheetData({
    context,
    operationIndex: setup.operationIndex,
    result: r,
    setupName: setup.name,
    machineName: setup.machineName,
    units,
    overrides: setup.overrides,
    machineStickoutMm: machine?.stickoutMm ?? null,
  });
  const api = `/api/v1/vendors/${vendor.slug}/setups/${setup.id}`;
  const downloads = (
    <>
      <AskAboutSheet vendorSlug={vendor.slug} vendorName={vendor.name} sheetVersionId={setup.sheetVersionId} machineId={setup.machineId} />
      <a href={`${api}/pdf`} className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-medium text-accent-ink">
        Setup sheet (PDF)
      </a>
      <a href={`${api}/csv`} className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4">
        Numbers (CSV)
      </a>
    </>
  );
  return (
    <>
      <PageHeader
        title={setup.name}
        lead={
          <>
            {setup.machineName} ·{" "}
            <Link className="underline" href={`/${vendor.slug}/library/${setup.sheetSlug}/v/${setup.versionNumber}`}>
              {setup.sheetTitle}, version {setup.versionNumber}
            </Link>{" "}
            · {op?.label}
            {setup.newerVersionNumber ? (
              <a href="#readapt" className="ml-2 rounded border border-amber-600 bg-amber-50 px-2 py-0.5 text-xs text-amber-900">
                ↑ v{setup.newerVersionNumber} is out: compare
              </a>
            ) : null}
          </>
        }
        actions={downloads}
      />
      <div className="grid gap-8 lg:grid-cols-2">
        <section aria-labelledby="numbers">
          <h2 id="numbers" className="text-lg font-semibold">
            Numbers on this machine
          </h2>
          <p className="mt-1 text-sm text-stone-700" data-entry-capability={setup.entryCapability}>
            Entry moves your CAM makes: {entryCapabilityLabels[setup.entryCapability]}.
          </p>
          {op ? (
            <ResultTable
              rows={resultRows(op, context.cutter, r)}
              units={units}
              headings={[`Sheet v${context.versionNumber}`, setup.machineName]}
            />
          ) : null}
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-setup-facts>
            <dt className="font-medium">Stick-out</dt>
            <dd className="num">{sheetData.stickout}</dd>
            <dt className="font-medium">Entry</dt>
            <dd>{sheetData.entryMethod}</dd>
          </dl>
          <section aria-labelledby="your-changes" className="mt-4" data-your-changes>
            <h3 id="your-changes" className="font-semibold">
              Your changes
            </h3>
            {sheetData.yourChanges.length ? (
              <ul className="num mt-1 list-disc pl-5 text-sm">
                {sheetData.yourChanges.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            ) : (
              <p className="mt-1 text-sm text-stone-600">None: the sheet&apos;s own depths and the machine&apos;s usual stick-out.</p>
            )}
          </section>
          <EntryAdvice result={r} entryCapability={setup.entryCapability} units={units} />
          {curve ? <FeedSpeedChart curve={curve} units={units} /> : null}
        </section>
        <section aria-labelledby="steps">
          <h2 id="steps" className="text-lg font-semibold">
            How they were found
          </h2>
          <StepsTrail steps={r.steps} units={units} emptyText={sheetData.noStepsNote} />
          <h2 className="mt-6 text-lg font-semibold">Before you cut</h2>
          <WarningList warnings={r.warnings} />
        </section>
      </div>
      {readapt ? (
        <ReadaptCompare
          old={r}
          oldNumber={setup.versionNumber}
          next={readapt}
          units={units}
          vendorSlug={vendor.slug}
          setupId={setup.id}
          yourChanges={sheetData.yourChanges}
        />
      ) : null}
      <div className="mt-8 grid gap-8 lg:grid-cols-2">
        <section aria-labelledby="report">
          <h2 id="report" className="mb-3 text-lg font-semibold">
            Report an outcome
          </h2>
          <OutcomeForm vendorSlug={vendor.slug} setupId={setup.id} units={units} current={current} />
        </section>
        <section aria-labelledby="history">
          <h2 id="history" className="mb-3 text-lg font-semibold">
            Outcome history
          </h2>
          <OutcomeHistory outcomes={outcomes} units={units} versionNumbers={numbers} photoHref={(o) => `${api}/outcomes/${o}/photo`} />
        </section>
      </div>
    </>
  );
}
