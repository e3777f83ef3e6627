import { randomUUID } from "node:crypto";
import { mkdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import path from "node:path";

import { assertStorageKey, type UploadStorage } from "./upload-storage";

/** Files under one root folder, fanned out by the first two characters of the key. */
export function filesystemStorage(root: string): UploadStorage {
  const base = path.resolve(root);
  const fileOf = (key: string) => {
    assertStorageKey(key);
    return path.join(base, key.slice(0, 2), key);
  };
  return {
    engine: "filesystem",
    async put(key, body) {
      const file = fileOf(key);
      await mkdir(path.dirname(file), { recursive: true });
      // Write then rename, so a reader never sees half a file.
      const temp = `${file}.${randomUUID()}.part`;
      await writeFile(temp, body);
      await rename(temp, file);
    },
    async get(key) {
      try {
        return await readFile(fileOf(key));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw error;
      }
    },
    async delete(key) {
      await rm(fileOf(key), { force: true });
    },
  };
}
