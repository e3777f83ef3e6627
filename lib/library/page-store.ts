// The stored Library pages of this process: whole anonymous HTML renderings, bounded by bytes and dropped least
// recently used first. Each holds the per-process placeholder nonce where Next put the nonce; every response
// gets a fresh nonce in its place (lib/library/page-store-proxy.ts). Nothing here reaches a client.
import type { UnitSystem } from "@/lib/machining/quantities";

import type { StoredBody } from "./page-store-body";

export type StoredPage = {
  vendorId: string;
  /** The vendor's Library generation the page was rendered under; served only while it is still current. */
  generation: string;
  /** The version the page shows, for the view counter. */
  versionId: string | null;
  /** The HTML, split where the placeholder nonce stood (lib/library/page-store-body.ts). */
  body: StoredBody;
  /** Response headers of the rendering worth keeping (content type, vary, link). */
  headers: [string, string][];
  /** Counts a view of the page (the page itself is not rendered for a stored answer). */
  onServe?: () => void;
};

/** Pages are stored per path and unit system (the `sb-units` cookie changes every number on them). */
export const pageStoreKey = (pathname: string, units: UnitSystem) => `${units} ${pathname}`;

export class PageStore {
  private entries = new Map<string, { page: StoredPage; bytes: number }>();
  private used = 0;

  constructor(private readonly maxBytes: number) {}

  get(key: string): StoredPage | undefined {
    const entry = this.entries.get(key);
    if (!entry) return undefined;
    // Map keeps insertion order: taking the entry out and back in makes it the most recently used.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.page;
  }

  set(key: string, page: StoredPage): void {
    this.delete(key);
    const bytes = page.body.bytes + key.length + page.headers.reduce((n, [k, v]) => n + k.length + v.length, 0);
    if (bytes > this.maxBytes) return;
    this.entries.set(key, { page, bytes });
    this.used += bytes;
    for (const [oldest, entry] of this.entries) {
      if (this.used <= this.maxBytes) break;
      this.entries.delete(oldest);
      this.used -= entry.bytes;
    }
  }

  delete(key: string): void {
    const entry = this.entries.get(key);
    if (!entry) return;
    this.entries.delete(key);
    this.used -= entry.bytes;
  }

  /** Drops every page of a vendor rendered under another generation than the current one (its Library changed). */
  dropStale(vendorId: string, currentGeneration: string): void {
    for (const [key, entry] of this.entries) {
      if (entry.page.vendorId === vendorId && entry.page.generation !== currentGeneration) this.delete(key);
    }
  }

  get size(): number {
    return this.entries.size;
  }

  get bytes(): number {
    return this.used;
  }
}

/**
 * A stored header with the placeholder replaced by this response's nonce. The placeholder is random per process
 * and never leaves it, and vendor text renders with HTML off, so only Next's own nonce attributes carry it.
 */
export function withNonce(value: string, placeholder: string, nonce: string): string {
  return value.split(placeholder).join(nonce);
}
