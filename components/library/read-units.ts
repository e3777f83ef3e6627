import "server-only";

import { cookies } from "next/headers";

import type { UnitSystem } from "@/lib/machining";

/** The reader's unit system from the toggle's cookie (metric by default). */
export async function readUnits(): Promise<UnitSystem> {
  return (await cookies()).get("sb-units")?.value === "imperial" ? "imperial" : "metric";
}
