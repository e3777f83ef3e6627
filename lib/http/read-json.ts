import "server-only";

import { InvalidInput, TooLarge, UnsupportedMediaType } from "@/lib/errors/domain-errors";

export const DEFAULT_MAX_JSON_BYTES = 64 * 1024;

const JSON_TYPE = /^application\/(?:[\w.+-]+\+)?json\s*(?:;|$)/i;

/**
 * The body's bytes, read from the stream with a cap: past `maxBytes` the read stops and answers 413, whether or
 * not the client declared a Content-Length.
 */
export async function readBodyBytes(
  request: Request,
  maxBytes: number,
  tooLargeMessage = `The body is larger than ${maxBytes} bytes.`,
): Promise<Uint8Array<ArrayBuffer>> {
  const tooLarge = () => new TooLarge(tooLargeMessage);
  if (Number(request.headers.get("content-length") ?? "0") > maxBytes) throw tooLarge();
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/** Read a JSON body: application/json only (415), a size cap (413) and a clear 400 for malformed JSON. */
export async function readJson(request: Request, maxBytes = DEFAULT_MAX_JSON_BYTES): Promise<unknown> {
  if (!JSON_TYPE.test(request.headers.get("content-type") ?? "")) {
    throw new UnsupportedMediaType("Send the body as JSON with the header Content-Type: application/json.");
  }
  const bytes = await readBodyBytes(request, maxBytes);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new InvalidInput("The body is not valid UTF-8.");
  }
  try {
    return JSON.parse(text);
  } catch {
    throw new InvalidInput("The body is not valid JSON.");
  }
}
