import { describe, expect, it } from "vitest";

import { MAX_UPLOAD_BYTES, sniffUpload } from "@/lib/storage/sniff-upload";

// PNG signature (ISO/IEC 15948 §5.2): 89 50 4E 47 0D 0A 1A 0A, then an IHDR chunk.
const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a2a0e1df0000000049454e44ae426082",
  "hex",
);
// JPEG starts with SOI FF D8 and an APP0/JFIF marker; its SOF0 frame header states 64 × 48 pixels.
const JPEG = Buffer.concat([
  Buffer.from("ffd8ffe000104a46494600010100000100010000", "hex"),
  Buffer.from("ffc0001108003000400301220002110103110100", "hex"),
  Buffer.alloc(64, 0),
  Buffer.from("ffd9", "hex"),
]);
const PDF = Buffer.from("%PDF-1.4\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n");
const HTML = Buffer.from("<!doctype html><html><body><script>alert(1)</script></body></html>");

describe("sniffUpload decides by content", () => {
  it("accepts a PNG by its signature whatever the name", async () => {
    expect(await sniffUpload(PNG, "chips.txt")).toEqual({ kind: "image", contentType: "image/png", extension: "png" });
  });

  it("accepts JPEG and PDF by their magic bytes", async () => {
    expect((await sniffUpload(JPEG, "finish")).contentType).toBe("image/jpeg");
    expect((await sniffUpload(PDF, "notes.bin")).kind).toBe("pdf");
  });

  it("refuses an HTML file renamed to .png", async () => {
    await expect(sniffUpload(HTML, "photo.png")).rejects.toThrow(/not accepted/);
    await expect(sniffUpload(HTML, "program.txt")).rejects.toThrow(/not accepted/);
  });

  it("accepts G-code text with a text file name", async () => {
    const gcode = Buffer.from("G21\nG90\nM3 S18000\nG1 X10 Y0 F1800\n");
    expect(await sniffUpload(gcode, "slot.nc")).toEqual({ kind: "text", contentType: "text/plain; charset=utf-8", extension: "txt" });
  });

  it("refuses text with NUL bytes or invalid UTF-8", async () => {
    await expect(sniffUpload(Buffer.from([0x47, 0x30, 0x00, 0x58]), "a.nc")).rejects.toThrow(/not accepted/);
    await expect(sniffUpload(Buffer.from([0x47, 0xc3, 0x28]), "a.nc")).rejects.toThrow(/not accepted/);
  });

  it("refuses a recognised type that is not on the list (a ZIP)", async () => {
    const zip = Buffer.concat([Buffer.from("504b0304", "hex"), Buffer.alloc(40, 0)]);
    await expect(sniffUpload(zip, "photo.png")).rejects.toThrow();
  });

  it("refuses a file one byte over 10 MB with a size error", async () => {
    const big = Buffer.concat([PNG, Buffer.alloc(MAX_UPLOAD_BYTES + 1 - PNG.length)]);
    await expect(sniffUpload(big, "big.png")).rejects.toMatchObject({ code: "too_large" });
    expect(MAX_UPLOAD_BYTES).toBe(10 * 1024 * 1024);
  });
});
