import { createHmac, timingSafeEqual } from "node:crypto";
import { createServer, type IncomingHttpHeaders, type Server } from "node:http";
import type { AddressInfo } from "node:net";

export type Received = { headers: IncomingHttpHeaders; body: string; at: number };

/**
 * A webhook receiver on 127.0.0.1 and a port the system picks. `answer` decides each reply (status and body);
 * "hang" never answers (for the timeout).
 */
export async function startReceiver(
  answer: (n: number) => { status: number; body?: string } | "hang" = () => ({ status: 200, body: "ok" }),
) {
  const received: Received[] = [];
  const server: Server = createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on("data", (c: Buffer) => chunks.push(c));
    request.on("end", () => {
      received.push({ headers: request.headers, body: Buffer.concat(chunks).toString("utf8"), at: Date.now() });
      const reply = answer(received.length);
      if (reply === "hang") return;
      response.writeHead(reply.status, { "content-type": "text/plain" }).end(reply.body ?? "");
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as AddressInfo).port;
  return {
    url: `http://127.0.0.1:${port}/hooks/swarfbook`,
    received,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

/**
 * The receiver's side of the documented check, written from the documentation (not with the app's helper):
 * HMAC-SHA256 with the secret over "<timestamp>.<raw body>", hex, in "sha256=<hex>"; timestamp within 5 minutes.
 */
export function receiverAccepts(secret: string, r: Received, nowSeconds = Math.floor(Date.now() / 1000)): boolean {
  const timestamp = String(r.headers["swarfbook-timestamp"] ?? "");
  const signature = String(r.headers["swarfbook-signature"] ?? "");
  if (!/^\d+$/.test(timestamp) || Math.abs(nowSeconds - Number(timestamp)) > 300) return false;
  const expected = Buffer.from(`sha256=${createHmac("sha256", secret).update(`${timestamp}.${r.body}`).digest("hex")}`);
  const given = Buffer.from(signature);
  return expected.length === given.length && timingSafeEqual(expected, given);
}
