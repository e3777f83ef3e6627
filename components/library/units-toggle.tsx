"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";

import type { UnitSystem } from "@/lib/machining";

export const UNITS_COOKIE = "sb-units";

function rememberUnits(next: UnitSystem) {
  document.cookie = `${UNITS_COOKIE}=${next}; path=/; max-age=31536000; samesite=lax`;
}

/** Metric or imperial for every number on the page; the choice is kept in a cookie for a year. */
export function UnitsToggle({ units }: { units: UnitSystem }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const choose = (next: UnitSystem) => {
    rememberUnits(next);
    start(() => router.refresh());
  };
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
