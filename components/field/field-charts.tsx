"use client";

import dynamic from "next/dynamic";

import type { SymptomPoint } from "./symptom-chart";
import type { VersionOutcomePoint } from "./version-outcomes-chart";

// recharts draws nothing useful on the server; both charts load in the browser only.
const VersionOutcomesChart = dynamic(() => import("./version-outcomes-chart").then((m) => m.VersionOutcomesChart), { ssr: false });
const SymptomChart = dynamic(() => import("./symptom-chart").then((m) => m.SymptomChart), { ssr: false });

export function FieldCharts({
  outcomes,
  symptoms,
  versions,
}: {
  outcomes: VersionOutcomePoint[];
  symptoms: SymptomPoint[];
  versions: string[];
}) {
  return (
    <div className="mt-6 grid gap-6 lg:grid-cols-2">
      <section aria-labelledby="outcomes-chart-heading" className="rounded-md border border-stone-300 bg-white p-4">
        <h2 id="outcomes-chart-heading" className="mb-2 font-semibold">
          Outcome reports per version
        </h2>
        <VersionOutcomesChart data={outcomes} />
      </section>
      <section aria-labelledby="symptom-chart-heading" className="rounded-md border border-stone-300 bg-white p-4">
        <h2 id="symptom-chart-heading" className="mb-2 font-semibold">
          Failures by symptom
        </h2>
        <SymptomChart data={symptoms} versions={versions} />
      </section>
    </div>
  );
}
