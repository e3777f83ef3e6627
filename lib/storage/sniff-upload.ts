import { fileTypeFromBuffer } from "file-type";
import { imageSize } from "image-size";

import { InvalidInput, TooLarge } from "@/lib/errors/domain-errors";

export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

export type UploadKind = "image" | "pdf" | "text";
export type SniffedUpload = { kind: UploadKind; contentType: string; extension: string };

const BY_MIME: Record<string, SniffedUpload> = {
  "image/png": { kind: "image", contentType: "image/png", extension: "png" },
  "image/jpeg": { kind: "image", contentType: "image/jpeg", extension: "jpg" },
  "image/webp": { kind: "image", contentType: "image/webp", extension: "webp" },
  "application/pdf": { kind: "pdf", contentType: "application/pdf", extension: "pdf" },
};

// A header can claim any size; decoding a 100,000 × 100,000 image would take tens of gigabytes. Photos from a phone
// or a camera stay well inside these.
export const MAX_IMAGE_SIDE = 20_000;
export const MAX_IMAGE_PIXELS = 100_000_000;

/** The dimensions the image's header states, refused when unreadable or beyond any real photo. */
function assertSaneDimensions(bytes: Buffer): void {
  let size: { width?: number; height?: number };
  try {
    size = imageSize(bytes);
  } catch {
    throw new InvalidInput("This image is damaged: its size cannot be read.");
  }
  const { width = 0, height = 0 } = size;
  if (!width || !height || width > MAX_IMAGE_SIDE || height > MAX_IMAGE_SIDE || width * height > MAX_IMAGE_PIXELS) {
    throw new InvalidInput(
      `This image claims to be ${width} × ${height} pixels, larger than any photo we accept (at most ${MAX_IMAGE_SIDE} pixels a side).`,
    );
  }
}

const TEXT_EXTENSIONS = new Set(["nc", "gcode", "ngc", "tap", "cnc", "txt"]);
// Markup that a browser would render if it were ever served as HTML; never accepted as "text".
const MARKUP = /^\s*<(?:!doctype|html|head|body|script|svg|iframe|\?xml|!--|[a-z]+[\s>])/i;

function isPlainText(bytes: Buffer): boolean {
  if (bytes.includes(0)) return false;
  try {
    const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
    return !MARKUP.test(text);
  } catch {
    return false;
  }
}

const extensionOf = (fileName: string) => /\.([a-z0-9]{1,8})$/i.exec(fileName)?.[1]?.toLowerCase() ?? "";

/**
 * Decides what an upload is from its bytes: PNG, JPEG, WebP, PDF, or G-code/plain text
 * (valid UTF-8, no NUL bytes, a text file name). The name never decides a binary type.
 */
export async function sniffUpload(bytes: Buffer, fileName = ""): Promise<SniffedUpload> {
  if (bytes.byteLength > MAX_UPLOAD_BYTES) throw new TooLarge("A file may be at most 10 MB.");
  if (bytes.byteLength === 0) throw new InvalidInput("The file is empty.");
  const detected = await fileTypeFromBuffer(bytes);
  if (detected) {
    const known = BY_MIME[detected.mime];
    if (known?.kind === "image") assertSaneDimensions(bytes);
    if (known) return known;
    throw new InvalidInput(`Files of type ${detected.mime} are not accepted: send a photo (PNG, JPEG, WebP), a PDF or a G-code text file.`);
  }
  if (TEXT_EXTENSIONS.has(extensionOf(fileName)) && isPlainText(bytes)) {
    return { kind: "text", contentType: "text/plain; charset=utf-8", extension: "txt" };
  }
  throw new InvalidInput(
    "This file is not accepted: send a photo (PNG, JPEG, WebP), a PDF or a G-code text file (.nc, .gcode, .tap, .txt).",
  );
}
