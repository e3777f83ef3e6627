import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

/** The text of a PDF as poppler's pdftotext reads it (layout kept), and its page count as pdftoppm renders it. */
export function readPdf(bytes: Uint8Array, { pngDir }: { pngDir?: string } = {}): { text: string; pages: number } {
  const dir = mkdtempSync(path.join(tmpdir(), "sb-pdf-"));
  try {
    const file = path.join(dir, "doc.pdf");
    writeFileSync(file, bytes);
    const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
    const out = pngDir ?? dir;
    execFileSync("pdftoppm", ["-png", "-r", "60", file, path.join(out, "page")]);
    const pages = readdirSync(out).filter((f) => /^page-\d+\.png$/.test(f)).length;
    return { text, pages };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
