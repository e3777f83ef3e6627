import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { deflateSync } from "node:zlib";
import { describe, expect, it } from "vitest";

import { InvalidInput } from "@/lib/errors/domain-errors";
import { sniffUpload } from "@/lib/storage/sniff-upload";

const DIR = path.resolve(import.meta.dirname, "../../fixtures/hostile/uploads");
const files = readdirSync(DIR).filter((f) => f !== "README.md");

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
const crc = (b: Buffer) => {
  let x = 0xffffffff;
  for (const v of b) x = crcTable[(x ^ v) & 0xff] ^ (x >>> 8);
  return (x ^ 0xffffffff) >>> 0;
};
const chunk = (type: string, data: Buffer) => {
  const td = Buffer.concat([Buffer.from(type), data]);
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  td.copy(out, 4);
  out.writeUInt32BE(crc(td), 8 + data.length);
  return out;
};
/** A real PNG of the given size (one grey row repeated), to show what is accepted. */
function png(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8;
  ihdr[9] = 0;
  const raw = Buffer.concat(Array.from({ length: height }, () => Buffer.concat([Buffer.from([0]), Buffer.alloc(width, 0x80)])));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", ihdr),
    chunk("IDAT", deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

describe("hostile uploads are refused by their content", () => {
  it("has the corpus", () => {
    expect(files).toEqual(
      expect.arrayContaining(["disguised-executable.png", "polyglot-gif-script.png", "oversized-header.png", "polyglot-markup.nc"]),
    );
  });

  it.each(files)("%s is refused with a clear message", async (file) => {
    const bytes = readFileSync(path.join(DIR, file));
    const error = await sniffUpload(bytes, file).then(
      () => null,
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(InvalidInput);
    expect((error as Error).message).toMatch(/not accepted|larger than any photo|damaged/);
  });

  it("an image header claiming a giant size is refused; a real photo size is accepted", async () => {
    await expect(sniffUpload(png(64, 48), "ok.png")).resolves.toMatchObject({ kind: "image", contentType: "image/png" });
    await expect(sniffUpload(readFileSync(path.join(DIR, "oversized-header.png")), "photo.png")).rejects.toThrow("100000 × 100000");
  });
});
