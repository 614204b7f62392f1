import { Readable } from "node:stream";
import { DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, PutObjectCommand, S3Client, S3ServiceException } from "@aws-sdk/client-s3";
import { assertKey, type Storage } from "./storage.ts";

export interface S3StorageOptions {
  bucket: string;
  region: string;
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
}

/**
 * An S3-compatible bucket through the AWS SDK. Path-style addressing and an explicit endpoint
 * let the same code talk to AWS, to self-hosted stores and to the s3rver fake in the tests.
 */
export function createS3Storage(opts: S3StorageOptions): Storage {
  const client = new S3Client({
    region: opts.region,
    forcePathStyle: true,
    ...(opts.endpoint ? { endpoint: opts.endpoint } : {}),
    ...(opts.accessKeyId && opts.secretAccessKey ? { credentials: { accessKeyId: opts.accessKeyId, secretAccessKey: opts.secretAccessKey } } : {}),
    // Many S3-compatible stores reject the SDK's newer default checksum headers; send them only when S3 requires them.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return {
    async put(key, bytes, contentType) {
      assertKey(key);
      await client.send(new PutObjectCommand({ Bucket: opts.bucket, Key: key, Body: bytes, ContentType: contentType, ContentLength: bytes.byteLength }));
    },
    async get(key) {
      assertKey(key);
      try {
        const out = await client.send(new GetObjectCommand({ Bucket: opts.bucket, Key: key }));
        if (!out.Body) return null;
        return { body: out.Body as Readable, sizeBytes: out.ContentLength ?? null };
      } catch (err) {
        if (err instanceof S3ServiceException && (err.name === "NoSuchKey" || err.$metadata.httpStatusCode === 404)) return null;
        throw err;
      }
    },
    async delete(key) {
      assertKey(key);
      await client.send(new DeleteObjectCommand({ Bucket: opts.bucket, Key: key }));
    },
    async *list() {
      let token: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket: opts.bucket, ContinuationToken: token }));
        for (const object of page.Contents ?? []) if (object.Key) yield object.Key;
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
    },
  };
}
