import http, { type IncomingMessage } from "node:http";
import https from "node:https";

import { FORWARDED_HEADER, PEER_HEADER } from "./peer-address-headers";

const marker = Symbol.for("swarfbook.recordPeerAddress");

/**
 * Stamps every incoming request with the address of the TCP peer and the X-Forwarded-For it arrived with,
 * before Next.js sees it (Next fills x-forwarded-for from the socket only when it is missing). Installed once per
 * process from instrumentation.ts; the route handlers read the stamps through clientIp().
 */
export function recordPeerAddress(): void {
  for (const Server of [http.Server, https.Server]) {
    const proto = Server.prototype as typeof Server.prototype & { [marker]?: true };
    if (proto[marker]) continue;
    const emit = proto.emit as (this: http.Server, event: string | symbol, ...args: unknown[]) => boolean;
    proto.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]) {
      if (event === "request") {
        const req = args[0] as IncomingMessage;
        const forwarded = req.headers["x-forwarded-for"];
        req.headers[PEER_HEADER] = req.socket?.remoteAddress ?? "";
        req.headers[FORWARDED_HEADER] = Array.isArray(forwarded) ? forwarded.join(", ") : (forwarded ?? "");
      }
      return emit.call(this, event, ...args);
    } as typeof proto.emit;
    proto[marker] = true;
  }
}
