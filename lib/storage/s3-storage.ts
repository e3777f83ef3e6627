import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, S3ServiceException } from "@aws-sdk/client-s3";

import { assertStorageKey, type UploadStorage } from "./upload-storage";

export type S3StorageConfig = {
  endpoint?: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
};

/** Any S3-compatible service (path-style addressing, so a loopback fake works too). */
export function s3Storage(config: S3StorageConfig): UploadStorage {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    forcePathStyle: true,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
  });
  const Bucket = config.bucket;
  return {
    engine: "s3",
    async put(key, body, contentType) {
      assertStorageKey(key);
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType }));
    },
    async get(key) {
      assertStorageKey(key);
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        if (!out.Body) return null;
        return Buffer.from(await out.Body.transformToByteArray());
      } catch (error) {
        if (error instanceof S3ServiceException && (error.name === "NoSuchKey" || error.$metadata.httpStatusCode === 404)) return null;
        throw error;
      }
    },
    async delete(key) {
      assertStorageKey(key);
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
  };
}
