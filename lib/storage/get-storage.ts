import { filesystemStorage } from "./filesystem-storage";
import { s3Storage } from "./s3-storage";
import type { UploadStorage } from "./upload-storage";

type Env = Record<string, string | undefined>;

const cache = new Map<string, UploadStorage>();

/** The storage engine chosen by configuration: STORAGE_ENGINE=s3, or the filesystem (default). */
export function storageFromEnv(env: Env): UploadStorage {
  if (env.STORAGE_ENGINE === "s3") {
    return s3Storage({
      endpoint: env.S3_ENDPOINT || undefined,
      bucket: env.S3_BUCKET ?? "swarfbook-uploads",
      region: env.S3_REGION ?? "us-east-1",
      accessKeyId: env.S3_ACCESS_KEY_ID ?? "S3RVER",
      secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? "S3RVER",
    });
  }
  return filesystemStorage(env.STORAGE_DIR ?? ".data/uploads");
}

export function getStorage(env: Env = process.env): UploadStorage {
  const id = [env.STORAGE_ENGINE, env.STORAGE_DIR, env.S3_ENDPOINT, env.S3_BUCKET, env.S3_REGION, env.S3_ACCESS_KEY_ID].join("|");
  let storage = cache.get(id);
  if (!storage) {
    storage = storageFromEnv(env);
    cache.set(id, storage);
  }
  return storage;
}
