// JavaScript a page makes the browser load before it is interactive: every script chunk the HTML names
// (script tags and the chunk lists in the flight data), gzip-compressed, summed. Chunks loaded later
// (next/dynamic, when scrolled into view) are not named in the HTML and are not counted.
import { gzipSync } from "node:zlib";

export async function pageJavaScript(baseUrl: string, path: string, cookie?: string) {
  const html = await (await fetch(baseUrl + path, { headers: cookie ? { cookie } : {} })).text();
  const chunks = [...new Set([...html.matchAll(/\/?_next\/static\/[^"'\\\s]+?\.js/g)].map((m) => (m[0].startsWith("/") ? m[0] : `/${m[0]}`)))];
  let raw = 0;
  let compressed = 0;
  for (const chunk of chunks) {
    const body = Buffer.from(await (await fetch(baseUrl + chunk)).arrayBuffer());
    raw += body.length;
    compressed += gzipSync(body, { level: 9 }).length;
  }
  return { chunks: chunks.length, raw, compressed };
}
