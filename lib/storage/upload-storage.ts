import { randomUUID } from "node:crypto";

/** Where uploaded bytes live. Keys are server-generated UUIDs; nothing a user typed reaches a path or object name. */
export interface UploadStorage {
  readonly engine: "filesystem" | "s3";
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or null when the key holds nothing. */
  get(key: string): Promise<Buffer | null>;
  delete(key: string): Promise<void>;
}

const KEY = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export function newStorageKey(): string {
  return randomUUID();
}

/** Refuses anything that is not a key this module generated (path traversal, user-chosen names). */
export function assertStorageKey(key: string): void {
  if (!KEY.test(key)) throw new Error("Invalid storage key.");
}
