import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import type { CoverageCluster, CoverageReport } from "@/lib/field/coverage-gaps";

const newClassHref = (vendorSlug: string, c: CoverageCluster) =>
  `/${vendorSlug}/drafting/machine-classes/new?${new URLSearchParams({
    rpmMin: String(c.rpmMinMedian),
    rpmMax: String(c.rpmMax.median),
    powerKw: String(c.powerKw.median),
    rigidity: String(c.rigidityMedian),
    description: `For the ${c.machines} registered machines of a Field-results coverage gap: ${c.summary.split(":")[0].replace(/^\S+ machines? with /, "")}.`,
  })}`;

const span = (r: { min: number; max: number }, unit: string) =>
  r.min === r.max
    ? `${r.min.toLocaleString("en-GB")} ${unit}`
    : `${r.min.toLocaleString("en-GB")}–${r.max.toLocaleString("en-GB")} ${unit}`;

export function CoverageGapList({ report, vendorSlug }: { report: CoverageReport; vendorSlug: string }) {
  if (!report.machines)
    return <EmptyState title="No machines registered">Customers have not registered a machine on their Bench yet.</EmptyState>;
  return (
    <div className="space-y-3">
      <p className="text-sm text-stone-700">
        <span className="num">{report.covered}</span> of <span className="num">{report.machines}</span> registered machines fall inside one
        of the <span className="num">{report.classes}</span> machine classes you publish sheets for;{" "}
        <span className="num">{report.uncovered}</span> do not.
      </p>
      {report.clusters.length === 0 ? (
        <EmptyState title="No coverage gaps">Every registered machine is covered by a published machine class.</EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2" data-testid="coverage-gaps">
          {report.clusters.map((c) => (
            <li key={c.key} className="rounded-md border border-stone-300 bg-white p-4 text-sm">
              <p className="font-medium">{c.summary}</p>
              <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-1 text-stone-700">
                <dt>Top speed</dt>
                <dd className="num">{span(c.rpmMax, "rpm")}</dd>
                <dt>Spindle power</dt>
                <dd className="num">{span(c.powerKw, "kW")}</dd>
                {c.nearestClass ? (
                  <>
                    <dt>Nearest class</dt>
                    <dd>
                      {c.nearestClass.name}{" "}
                      <span className="num text-stone-500">
                        ({c.nearestClass.rpmMax.toLocaleString("en-GB")} rpm, {c.nearestClass.powerKw} kW)
                      </span>
                    </dd>
                  </>
                ) : null}
              </dl>
              <Link className="mt-3 inline-flex min-h-11 items-center underline" href={newClassHref(vendorSlug, c)}>
                Draft a machine class for them
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
