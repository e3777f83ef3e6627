import { fileTypeFromBuffer } from "file-type";

import { InvalidInput, TooLarge } from "@/lib/errors/domain-errors";

export const MAX_IMAGE_BYTES = 5 * 1024 * 1024;
const ALLOWED = new Set(["image/png", "image/jpeg", "image/webp"]);

/** The image's real type, read from its bytes (never from the file name or the browser's claim). */
export async function checkImage(bytes: Uint8Array): Promise<string> {
  if (bytes.byteLength === 0) throw new InvalidInput("Choose an image file.", { image: ["Choose an image file."] });
  if (bytes.byteLength > MAX_IMAGE_BYTES) throw new TooLarge("The image is larger than 5 MB.");
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !ALLOWED.has(type.mime)) {
    const message = "The image must be a PNG, JPEG or WebP file.";
    throw new InvalidInput(message, { image: [message] });
  }
  return type.mime;
}
