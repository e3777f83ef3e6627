"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";

import type { UnitSystem } from "@/lib/machining";
import { rememberUnits } from "@/lib/ui/units-cookie";

/**
 * The reader's units as the page was rendered with them (from the cookie), and a way to change them: the choice
 * goes into the cookie and the page is rendered again, so every switch on it shows the same units. A choice made
 * here shows at once, until the page comes back with it.
 */
export function useUnitsPreference(pageUnits: UnitSystem) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [units, setUnits] = useState(pageUnits);
  const [rendered, setRendered] = useState(pageUnits);
  // The page came back with other units (this switch or another one changed the cookie): follow them.
  if (rendered !== pageUnits) {
    setRendered(pageUnits);
    setUnits(pageUnits);
  }
  const choose = (next: UnitSystem) => {
    setUnits(next);
    rememberUnits(next);
    start(() => router.refresh());
  };
  return { units, choose, pending };
}
