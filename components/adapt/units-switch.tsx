"use client";

import type { UnitSystem } from "@/lib/machining";

/**
 * Metric or imperial for the panel's numbers and bare inputs. The panel passes the reader's one units preference
 * (`useUnitsPreference`): switching here switches the page too.
 */
export function UnitsSwitch({
  units,
  onChange,
  pending = false,
}: {
  units: UnitSystem;
  onChange: (units: UnitSystem) => void;
  pending?: boolean;
}) {
  return (
    <div role="group" aria-label="Units" aria-busy={pending} className="inline-flex rounded border border-stone-300">
      {(["metric", "imperial"] as const).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={units === u}
          onClick={() => onChange(u)}
          className="min-h-11 min-w-24 px-3 text-sm aria-pressed:bg-stone-800 aria-pressed:text-white"
        >
          {u === "metric" ? "mm, kW" : "in, hp"}
        </button>
      ))}
    </div>
  );
}
