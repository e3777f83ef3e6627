"use client";

import { usePathname, useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";

import { searchParamsToQuery } from "@/search/run/search-params";

export const URL_KEYS = ["q", "material", "materialGroup", "operation", "diameterMm", "flutes", "page"] as const;
export type UrlState = Partial<Record<(typeof URL_KEYS)[number], string>>;

/**
 * The search lives in the URL, so it can be shared and the back button walks through it.
 * Writes go through window.history, which Next keeps in sync with useSearchParams without a server round trip.
 */
export function useSearchUrl() {
  const params = useSearchParams();
  const pathname = usePathname();
  const state = useMemo<UrlState>(
    () => Object.fromEntries(URL_KEYS.flatMap((k) => (params.get(k) ? [[k, params.get(k)!]] : []))),
    [params],
  );
  const query = searchParamsToQuery(state);
  const write = useCallback(
    (next: UrlState, mode: "push" | "replace") => {
      const qs = searchParamsToQuery({ ...state, ...next });
      const url = qs ? `${pathname}?${qs}` : pathname;
      if (mode === "push") window.history.pushState(null, "", url);
      else window.history.replaceState(null, "", url);
    },
    [pathname, state],
  );
  return { state, query, write };
}
