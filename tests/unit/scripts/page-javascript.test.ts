import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { gzipSync } from "node:zlib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { pageJavaScript } from "@/scripts/bench-pages/page-javascript";

const chunks: Record<string, string> = {
  "/_next/static/chunks/main.js": "console.log('main');".repeat(50),
  "/_next/static/chunks/late.js": "console.log('named in the flight data');".repeat(20),
  "/_next/static/chunks/polyfills.js": "var polyfill = 1;".repeat(400),
};
const html = `<html><head><script src="/_next/static/chunks/polyfills.js" noModule="" nonce="x"></script>
<script src="/_next/static/chunks/main.js" async=""></script></head>
<body><script>self.__next_f.push([1,"2:I[1,[\\"/_next/static/chunks/late.js\\"]]"])</script></body></html>`;

let server: Server;
let base = "";

beforeAll(async () => {
  server = createServer((req, res) => {
    const body = req.url === "/page" ? html : chunks[req.url ?? ""];
    res.writeHead(body === undefined ? 404 : 200).end(body ?? "");
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe("bench:pages JavaScript of a page", () => {
  it("counts the chunks of script tags and flight data, not the noModule polyfills a module browser never loads", async () => {
    const js = await pageJavaScript(base, "/page");
    const counted = ["/_next/static/chunks/main.js", "/_next/static/chunks/late.js"].map((c) => chunks[c]);
    expect(js).toEqual({
      chunks: 2,
      raw: counted.reduce((n, c) => n + Buffer.byteLength(c), 0),
      compressed: counted.reduce((n, c) => n + gzipSync(c, { level: 9 }).length, 0),
      skippedNoModule: 1,
    });
  });
});
