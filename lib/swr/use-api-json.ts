"use client";

import useSWR, { type SWRConfiguration } from "swr";

export async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error(`${res.status} ${res.statusText}`);
  return (await res.json()) as T;
}

/** SWR over one of our JSON endpoints (session cookie auth). */
export function useApiJson<T>(url: string | null, options: SWRConfiguration<T> = {}) {
  return useSWR<T>(url, (u: string) => fetchJson<T>(u), options);
}
