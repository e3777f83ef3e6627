export { getStorage, storageFromEnv } from "./get-storage";
export { filesystemStorage } from "./filesystem-storage";
export { s3Storage, type S3StorageConfig } from "./s3-storage";
export { MAX_UPLOAD_BYTES, sniffUpload, type SniffedUpload, type UploadKind } from "./sniff-upload";
export { assertStorageKey, newStorageKey, type UploadStorage } from "./upload-storage";
