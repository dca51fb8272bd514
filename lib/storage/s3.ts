// Photos in an S3-compatible bucket (the official @aws-sdk/client-s3), shared by every instance.
// S3_ENDPOINT and S3_FORCE_PATH_STYLE reach non-AWS servers (MinIO, Ceph, a local fake). Checksums
// are sent only where an operation requires them: not every S3-compatible server understands the
// SDK's newer default CRC32 headers.
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import type { Env } from "@/lib/env";
import type { PhotoStore } from "./store";

const PREFIX = "photos/";

export function createS3Store(env: Env): PhotoStore {
  const bucket = env.S3_BUCKET!;
  const client = new S3Client({
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    forcePathStyle: env.S3_FORCE_PATH_STYLE ?? Boolean(env.S3_ENDPOINT),
    credentials:
      env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
        ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
        : undefined,
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return {
    kind: "s3",
    async put(storageKey, bytes, contentType) {
      // S3 answers a PUT only after the object is stored; reads after it see it (strong
      // read-after-write consistency, AWS S3 user guide "Amazon S3 data consistency model").
      await client.send(
        new PutObjectCommand({ Bucket: bucket, Key: PREFIX + storageKey, Body: bytes, ContentType: contentType }),
      );
    },
    async get(storageKey) {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket: bucket, Key: PREFIX + storageKey }));
        if (!object.Body) throw new Error(`S3 object ${storageKey} has no body`);
        return await object.Body.transformToByteArray();
      } catch (error) {
        if (error instanceof NoSuchKey)
          throw Object.assign(new Error(`No stored photo ${storageKey}`), { code: "ENOENT" });
        throw error;
      }
    },
    async remove(storageKey) {
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: PREFIX + storageKey }));
    },
  };
}
