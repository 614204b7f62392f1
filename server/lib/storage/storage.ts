import type { Readable } from "node:stream";

/**
 * Where file bytes (photos, PDFs) live. Keys are made by the server only, never from a user's
 * file name. Swapping the local disk for S3-compatible storage is a configuration change, which
 * is what lets several stateless server processes share files.
 */
export interface Storage {
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The stored bytes as a stream, or null when nothing is stored under the key. */
  get(key: string): Promise<StoredObject | null>;
  /** Removes the object; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
  /** Every stored key (for backups), in no particular order. */
  list(): AsyncIterable<string>;
}

export interface StoredObject {
  body: Readable;
  sizeBytes: number | null;
}

// Keys are ours (uuid-based), so anything outside this shape is a bug, not user input.
const KEY_PATTERN = /^[a-z0-9][a-z0-9_-]*(\/[a-z0-9][a-z0-9_.-]*)*$/i;

export function assertKey(key: string): void {
  if (!KEY_PATTERN.test(key) || key.includes("..") || key.length > 500) throw new Error(`invalid storage key: ${JSON.stringify(key)}`);
}

/** Reads a whole stored object; for tests and small files. */
export async function readAll(object: StoredObject): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of object.body) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}
