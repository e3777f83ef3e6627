import "server-only";

import http from "node:http";
import https from "node:https";
import type { LookupFunction } from "node:net";

import type { ResolvedTarget } from "./resolve-target";
import { RESPONSE_EXCERPT_CHARS } from "./webhook-settings";

export type PostResult = { status: number | null; error: string | null; excerpt: string | null; durationMs: number };

const MAX_READ_BYTES = 4096;

/**
 * POST one signed body to the resolved address (never another: the lookup is pinned), with one deadline for
 * the whole exchange. Redirects are not followed; only the first bytes of the answer are read and kept.
 */
export function postWebhook(target: ResolvedTarget, body: string, headers: Record<string, string>, timeoutMs: number): Promise<PostResult> {
  const started = Date.now();
  const pinned: LookupFunction = (_hostname, options, callback) => {
    if (options?.all)
      (callback as unknown as (e: null, a: { address: string; family: number }[]) => void)(null, [
        { address: target.address, family: target.family },
      ]);
    else callback(null, target.address, target.family);
  };
  const client = target.url.protocol === "https:" ? https : http;
  return new Promise((resolve) => {
    let settled = false;
    const finish = (result: Omit<PostResult, "durationMs">) => {
      if (settled) return;
      settled = true;
      clearTimeout(deadline);
      resolve({ ...result, durationMs: Date.now() - started });
    };
    const request = client.request(
      target.url,
      {
        method: "POST",
        lookup: pinned,
        headers: {
          "content-type": "application/json",
          "user-agent": "Swarfbook-Webhooks/1",
          "content-length": String(Buffer.byteLength(body)),
          ...headers,
        },
        ...(target.url.protocol === "https:" ? { servername: target.url.hostname } : {}),
      },
      (response) => {
        const chunks: Buffer[] = [];
        let read = 0;
        response.on("data", (chunk: Buffer) => {
          if (read < MAX_READ_BYTES) chunks.push(chunk.subarray(0, MAX_READ_BYTES - read));
          read += chunk.length;
          if (read >= MAX_READ_BYTES) response.destroy();
        });
        const done = () => finish({ status: response.statusCode ?? null, error: null, excerpt: excerptOf(Buffer.concat(chunks)) });
        response.on("end", done);
        response.on("close", done);
        response.on("error", done);
      },
    );
    const deadline = setTimeout(() => {
      request.destroy();
      finish({ status: null, error: `No answer within ${timeoutMs} ms.`, excerpt: null });
    }, timeoutMs);
    request.on("error", (error) => finish({ status: null, error: describe(error), excerpt: null }));
    request.end(body);
  });
}

function excerptOf(bytes: Buffer): string | null {
  if (bytes.length === 0) return null;
  // Control characters out, length capped: the log shows a hint of the answer, not the answer.
  return bytes
    .toString("utf8")
    .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/g, "")
    .slice(0, RESPONSE_EXCERPT_CHARS);
}

function describe(error: Error & { code?: string }): string {
  return error.code ? `${error.code}: ${error.message}`.slice(0, 300) : error.message.slice(0, 300);
}
