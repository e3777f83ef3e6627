// What the proxy (proxy.ts) and the Library pages share about stored pages, in one object per server process.
// Proxy and pages are bundled apart, so module state is not shared between them: the object lives on globalThis
// under a symbol. No constant here is secret: the placeholder nonce and the render secret are drawn at start.
import { randomBytes } from "node:crypto";

import { PageStore } from "./page-store";

/** What a Library page tells the proxy about a rendering the proxy asked for (see noteStoredRender). */
export type RenderNote = { vendorId: string; versionId: string | null; onServe?: () => void };

type PageStoreState = {
  store: PageStore;
  /** Stands where Next puts the nonce in a stored page; replaced by a fresh nonce in every response. */
  placeholderNonce: string;
  /** Proves to the proxy that a request for a page to store came from the proxy itself, over loopback. */
  renderSecret: string;
  /** Renderings the proxy asked for, by token; a page fills in its note while it renders. */
  pending: Map<string, RenderNote | null>;
};

const KEY = Symbol.for("swarfbook.library.pageStore");
const DEFAULT_MAX_BYTES = 64 * 1024 * 1024;

function maxBytes(): number {
  const mb = Number(process.env.LIBRARY_PAGE_STORE_MB);
  return Number.isFinite(mb) && mb >= 0 ? mb * 1024 * 1024 : DEFAULT_MAX_BYTES;
}

export function pageStoreState(): PageStoreState {
  const holder = globalThis as typeof globalThis & { [KEY]?: PageStoreState };
  holder[KEY] ??= {
    store: new PageStore(maxBytes()),
    placeholderNonce: randomBytes(24).toString("base64url"),
    renderSecret: randomBytes(32).toString("base64url"),
    pending: new Map(),
  };
  return holder[KEY];
}
