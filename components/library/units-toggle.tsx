"use client";

import { useUnitsPreference } from "@/components/units/use-units-preference";
import type { UnitSystem } from "@/lib/machining";

/** Metric or imperial for every number on the page; the choice is kept in the units cookie for a year. */
export function UnitsToggle({ units: pageUnits }: { units: UnitSystem }) {
  const { units, choose, pending } = useUnitsPreference(pageUnits);
  return (
    <div
      role="group"
      aria-label="Units"
      className="no-print inline-flex rounded border border-stone-300 bg-white p-0.5"
      aria-busy={pending}
    >
      {(["metric", "imperial"] as const).map((system) => (
        <button
          key={system}
          type="button"
          aria-pressed={units === system}
          onClick={() => choose(system)}
          className="min-h-11 rounded px-4 text-sm font-medium aria-pressed:bg-stone-800 aria-pressed:text-white"
        >
          {system === "metric" ? "Metric (mm)" : "Imperial (in)"}
        </button>
      ))}
    </div>
  );
}
