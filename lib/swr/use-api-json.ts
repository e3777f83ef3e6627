"use client";

import useSWR, { type SWRConfiguration } from "swr";

import { ApiError, onErrorRetry } from "./retry";

export async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  if (!res.ok) {
    const retryAfter = Number(res.headers.get("retry-after"));
    throw new ApiError(res.status, Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null);
  }
  return (await res.json()) as T;
}

/** SWR over one of our JSON endpoints (session cookie auth); a 503 while the database restarts is retried. */
export function useApiJson<T>(url: string | null, options: SWRConfiguration<T> = {}) {
  return useSWR<T>(url, (u: string) => fetchJson<T>(u), { onErrorRetry, ...options });
}
