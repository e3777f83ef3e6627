import { mkdtemp, readdir, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { filesystemStorage } from "@/lib/storage/filesystem-storage";
import { s3Storage } from "@/lib/storage/s3-storage";
import { newStorageKey, type UploadStorage } from "@/lib/storage/upload-storage";

// The same contract for every engine behind getStorage().
function contract(name: string, make: () => UploadStorage) {
  describe(`${name} storage`, () => {
    it("returns the exact bytes that were put", async () => {
      const storage = make();
      const key = newStorageKey();
      const bytes = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 1, 2, 255]);
      await storage.put(key, bytes, "image/png");
      expect(Buffer.compare((await storage.get(key))!, bytes)).toBe(0);
    });

    it("answers null for a key that holds nothing, and after delete", async () => {
      const storage = make();
      const key = newStorageKey();
      expect(await storage.get(key)).toBeNull();
      await storage.put(key, Buffer.from("G0 X0 Y0\n"), "text/plain");
      await storage.delete(key);
      expect(await storage.get(key)).toBeNull();
    });

    it("refuses keys it did not generate, such as a path", async () => {
      const storage = make();
      await expect(storage.put("../../etc/passwd", Buffer.from("x"), "text/plain")).rejects.toThrow(/Invalid storage key/);
      await expect(storage.get("a/../b")).rejects.toThrow(/Invalid storage key/);
    });
  });
}

let dir = "";
let s3Dir = "";
let s3: S3rver;
const port = 4600 + Math.floor(Math.random() * 300);

beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), "sbk-fs-"));
  s3Dir = await mkdtemp(path.join(os.tmpdir(), "sbk-s3-"));
  s3 = new S3rver({ address: "127.0.0.1", port, silent: true, directory: s3Dir, configureBuckets: [{ name: "contract" }] });
  await s3.run();
});

afterAll(async () => {
  await s3?.close();
  await rm(dir, { recursive: true, force: true });
  await rm(s3Dir, { recursive: true, force: true });
});

contract("filesystem", () => filesystemStorage(dir));
contract("s3 (s3rver)", () =>
  s3Storage({
    endpoint: `http://127.0.0.1:${port}`,
    bucket: "contract",
    region: "us-east-1",
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
  }),
);

describe("filesystem layout", () => {
  it("names files by the key only, inside the root", async () => {
    const storage = filesystemStorage(dir);
    const key = newStorageKey();
    await storage.put(key, Buffer.from("x"), "text/plain");
    expect(await readdir(path.join(dir, key.slice(0, 2)))).toContain(key);
  });
});
