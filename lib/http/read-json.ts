import "server-only";

import { InvalidInput, TooLarge } from "@/lib/errors/domain-errors";

export const DEFAULT_MAX_JSON_BYTES = 64 * 1024;

/** Read a JSON body with a size cap (413 past it) and a clear 400 for malformed JSON. */
export async function readJson(request: Request, maxBytes = DEFAULT_MAX_JSON_BYTES): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new TooLarge(`The body is larger than ${maxBytes} bytes.`);
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) throw new TooLarge(`The body is larger than ${maxBytes} bytes.`);
  try {
    return JSON.parse(text);
  } catch {
    throw new InvalidInput("The body is not valid JSON.");
  }
}
