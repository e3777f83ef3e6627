import "server-only";

import { revalidateTag } from "next/cache";

// Tags of the Library's cached reads and renderings ('use cache' entries in components/library).
export const libraryTag = (vendorId: string) => `library:${vendorId}`;
export const librarySheetTag = (sheetId: string) => `library-sheet:${sheetId}`;

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
