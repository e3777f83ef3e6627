import "server-only";

import { cookies } from "next/headers";

import type { UnitSystem } from "@/lib/machining";
import { UNITS_COOKIE, unitsFromCookie } from "@/lib/ui/units-cookie";

/** The reader's unit system from the units cookie (metric by default). */
export async function readUnits(): Promise<UnitSystem> {
  return unitsFromCookie((await cookies()).get(UNITS_COOKIE)?.value);
}
