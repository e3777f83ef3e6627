"use client";

import useSWR from "swr";

import type { SearchResponse } from "@/search/run/search-response";

import { onErrorRetry } from "./retry";
import { searchApiUrl } from "./search-url";
import { fetchJson } from "./use-api-json";

/** Search results for a URL query string; the previous results stay on screen while the next ones load. */
export function useSearch(vendorSlug: string, query: string) {
  return useSWR<SearchResponse>(searchApiUrl(vendorSlug, query), (url: string) => fetchJson<SearchResponse>(url), {
    keepPreviousData: true,
    revalidateOnFocus: false,
    dedupingInterval: 5000,
    onErrorRetry,
  });
}
