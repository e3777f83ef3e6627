"use client";

import type { ReactNode } from "react";
import { SWRConfig } from "swr";

import type { SearchResponse } from "@/search/run/search-response";

/** Seeds SWR with the server's first answer for this URL, so the page opens with results and no spinner. */
export function SearchPageShell({
  fallbackKey,
  fallback,
  children,
}: {
  fallbackKey: string;
  fallback: SearchResponse;
  children: ReactNode;
}) {
  return <SWRConfig value={{ fallback: { [fallbackKey]: fallback } }}>{children}</SWRConfig>;
}
