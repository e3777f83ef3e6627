// JavaScript a page makes the browser load before it is interactive: every script chunk the HTML names
// (script tags and the chunk lists in the flight data), gzip-compressed, summed. Chunks loaded later
// (next/dynamic, when scrolled into view) are not named in the HTML and are not counted; nor are the
// `noModule` polyfills, which a browser that runs modules (every current one) never downloads.
import { gzipSync } from "node:zlib";

const CHUNK = /\/?_next\/static\/[^"'\\\s]+?\.js/g;
const NO_MODULE_SCRIPT = /<script\b[^>]*\bsrc="([^"]+\.js)"[^>]*\bnoModule\b[^>]*>/gi;

export async function pageJavaScript(baseUrl: string, path: string, cookie?: string) {
  const html = await (await fetch(baseUrl + path, { headers: cookie ? { cookie } : {} })).text();
  const absolute = (p: string) => (p.startsWith("/") ? p : `/${p}`);
  const noModule = new Set([...html.matchAll(NO_MODULE_SCRIPT)].map((m) => absolute(m[1])));
  const chunks = [...new Set([...html.matchAll(CHUNK)].map((m) => absolute(m[0])))].filter((c) => !noModule.has(c));
  let raw = 0;
  let compressed = 0;
  for (const chunk of chunks) {
    const body = Buffer.from(await (await fetch(baseUrl + chunk)).arrayBuffer());
    raw += body.length;
    compressed += gzipSync(body, { level: 9 }).length;
  }
  return { chunks: chunks.length, raw, compressed, skippedNoModule: noModule.size };
}
