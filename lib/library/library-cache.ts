import "server-only";

import { revalidateTag } from "next/cache";

import { db } from "@/lib/db/knex";

// Tags of the Library's cached reads and renderings ('use cache' entries in components/library).
export const libraryTag = (vendorId: string) => `library:${vendorId}`;
export const librarySheetTag = (sheetId: string) => `library-sheet:${sheetId}`;

/**
 * The connection the cached Library reads use: the primary, never the read replica. An entry dropped by a publish
 * is filled again by the next reader, often within milliseconds; filled from a standby that has not replayed the
 * publish yet, it would keep the old version until it expires. The cache takes the load the replica would take.
 */
export const libraryCacheDb = db;

/**
 * Drops the cached Library entries a change touches: the sheet's own, and the vendor's (catalogue cards,
 * branding, the index). Outside a Next.js server (seeds, scripts, tests) there is no such cache to drop.
 */
export function invalidateLibrary({ vendorId, sheetId }: { vendorId: string; sheetId?: string }) {
  // Expired at once, never served stale: a withdrawn version must not be read as current even once.
  try {
    revalidateTag(libraryTag(vendorId), { expire: 0 });
    if (sheetId) revalidateTag(librarySheetTag(sheetId), { expire: 0 });
  } catch (error) {
    if (error instanceof Error && error.message.startsWith("Invariant: static generation store missing")) return;
    throw error;
  }
}
