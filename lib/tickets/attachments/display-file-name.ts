import type { SniffedUpload } from "@/lib/storage/sniff-upload";

/**
 * A name to show and to offer on download. It is never used for a path (storage keys are UUIDs);
 * the extension follows the sniffed type, so "photo.txt" holding a PNG is offered as "photo.png".
 */
export function displayFileName(original: string, sniffed: SniffedUpload): string {
  const base = (original.split(/[\\/]/).pop() ?? "")
    .normalize("NFC")
    .replace(/[\u0000-\u001f\u007f"<>|:*?]/g, "")
    .trim();
  const dot = base.lastIndexOf(".");
  const stem = (dot > 0 ? base.slice(0, dot) : base).slice(0, 100) || "file";
  const ext = sniffed.kind === "text" && dot > 0 ? base.slice(dot + 1).toLowerCase() : sniffed.extension;
  return `${stem}.${ext}`;
}

/** Content-Disposition with an ASCII fallback and the UTF-8 name (RFC 6266 / RFC 8187). */
export function contentDisposition(kind: "inline" | "attachment", fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}
