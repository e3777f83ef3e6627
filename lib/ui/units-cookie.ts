import type { UnitSystem } from "@/lib/machining";

// The reader's units live in one cookie, read by the server for every page (`readUnits`) and written by every
// units switch in the browser (`rememberUnits`): the Library's toggle and the adapt panel's switch change the
// same preference, and the page follows it.

export const UNITS_COOKIE = "sb-units";

/** The unit system a cookie value names; anything else (or none) is metric. */
export const unitsFromCookie = (value: string | undefined): UnitSystem => (value === "imperial" ? "imperial" : "metric");

/** Keeps the choice for a year (browser only). */
export function rememberUnits(next: UnitSystem) {
  document.cookie = `${UNITS_COOKIE}=${next}; path=/; max-age=31536000; samesite=lax`;
}
