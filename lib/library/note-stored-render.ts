import "server-only";

import { headers } from "next/headers";

import { STORE_TOKEN_HEADER } from "./page-store-proxy";
import { pageStoreState, type RenderNote } from "./page-store-state";

/**
 * For a Library page the page store may hold: true when this rendering is the proxy's own (lib/library/
 * page-store-proxy.ts), after noting which vendor and version it shows, so the proxy can store it and count its
 * views. A rendering the proxy did not ask for (the token is unknown) notes nothing.
 */
export async function noteStoredRender(note: RenderNote): Promise<boolean> {
  const token = (await headers()).get(STORE_TOKEN_HEADER);
  const { pending } = pageStoreState();
  if (!token || !pending.has(token)) return false;
  pending.set(token, note);
  return true;
}
