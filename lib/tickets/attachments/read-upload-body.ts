import "server-only";

import { TooLarge } from "@/lib/errors/domain-errors";
import { MAX_UPLOAD_BYTES } from "@/lib/storage/sniff-upload";

/** Reads a raw upload body, refusing (413) past 10 MB by the declared length or while streaming. */
export async function readUploadBody(request: Request, maxBytes = MAX_UPLOAD_BYTES): Promise<Buffer> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new TooLarge("A file may be at most 10 MB.");
  if (!request.body) return Buffer.alloc(0);
  const chunks: Uint8Array[] = [];
  let size = 0;
  const reader = request.body.getReader();
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel();
      throw new TooLarge("A file may be at most 10 MB.");
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}
