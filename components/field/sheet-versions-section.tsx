import { OUTCOME_SYMPTOMS, outcomeSymptomLabels } from "@/content-schema/outcome-fields";
import { compareVersions } from "@/lib/field/compare-versions";
import { findSheetResults } from "@/lib/field/page-data";

import { FieldCharts } from "./field-charts";
import { VersionRollupTable } from "./version-rollup-table";

/** A sheet's field results version by version: the table, each version against the one before, the charts. */
export async function SheetVersionsSection({
  vendorSlug,
  vendorId,
  sheet,
  z,
  confidenceLabel,
}: {
  vendorSlug: string;
  vendorId: string;
  sheet: { id: string; slug: string };
  z: number;
  confidenceLabel: string;
}) {
  const results = await findSheetResults(vendorId, sheet.id, z);
  const versions = results?.versions ?? [];
  if (versions.length === 0)
    return (
      <p className="text-sm text-stone-600">No published version of this sheet has field results yet; they refresh every few minutes.</p>
    );
  const comparisons = versions
    .slice(1)
    .map((v, i) => ({ number: v.number, changeNote: v.changeNote, ...compareVersions(versions[i], v, confidenceLabel) }));
  const chartVersions = versions.map((v) => `v${v.number}`);
  const outcomes = versions.map((v) => ({
    label: `v${v.number}`,
    asWritten: v.workedAsWritten,
    afterChanges: v.workedAfterChanges,
    failed: v.failed,
  }));
  const symptoms = OUTCOME_SYMPTOMS.map((s) => ({
    symptom: outcomeSymptomLabels[s],
    ...Object.fromEntries(versions.map((v) => [`v${v.number}`, v.symptoms[s]])),
  }));
  return (
    <>
      <div className="mb-2 flex justify-end">
        <a
          href={`/api/v1/vendors/${vendorSlug}/field/sheet-versions?sheet=${encodeURIComponent(sheet.slug)}`}
          className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3 text-sm"
          download
        >
          Export CSV<span className="sr-only"> of the versions</span>
        </a>
      </div>
      <VersionRollupTable versions={versions} confidenceLabel={confidenceLabel} />
      {comparisons.length ? (
        <section aria-labelledby="compare-heading" className="mt-6">
          <h2 id="compare-heading" className="mb-2 text-lg font-semibold">
            Against the previous version
          </h2>
          <ul className="space-y-2 text-sm" data-testid="version-comparisons">
            {comparisons.map((c) => (
              <li key={c.number} data-verdict={c.verdict} className="rounded-md border border-stone-300 bg-white px-4 py-3">
                <strong>Version {c.number}:</strong> {c.sentence}
                {c.changeNote ? <span className="block text-stone-600">Change note: {c.changeNote}</span> : null}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <FieldCharts outcomes={outcomes} symptoms={symptoms} versions={chartVersions} />
    </>
  );
}
