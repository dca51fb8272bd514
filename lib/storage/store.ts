// Where rider photos live: one interface, two places. The local folder (DATA_DIR/uploads) for a
// single instance and `npm run dev`; an S3-compatible bucket (S3_BUCKET …) that every instance
// shares. Keys are generated here (uuid + extension from the sniffed type), never derived from
// what the rider sent, so no name can reach a file system or a bucket path.
import { createHash, randomUUID } from "node:crypto";
import { getEnv } from "@/lib/env";
import type { CheckedPhoto, PhotoContentType } from "./photos";

export interface StoredFile {
  storageKey: string;
  sha256: string;
  sizeBytes: number;
}

export interface PhotoStore {
  readonly kind: "disk" | "s3";
  /** Stores the bytes durably under a new key; resolves once a read of the key would find them. */
  put(storageKey: string, bytes: Uint8Array, contentType: PhotoContentType): Promise<void>;
  get(storageKey: string): Promise<Uint8Array>;
  /** Removes the key; a missing key is not an error. */
  remove(storageKey: string): Promise<void>;
}

const KEY_PATTERN = /^[0-9a-f-]{36}\.(jpg|png|webp)$/;

/** Refuses any key this module did not make (a tampered row can name no other file or object). */
export function checkedKey(storageKey: string): string {
  if (!KEY_PATTERN.test(storageKey)) throw new Error(`Bad storage key ${storageKey}`);
  return storageKey;
}

export function sha256Hex(bytes: Uint8Array): string {
  return createHash("sha256").update(bytes).digest("hex");
}

const holder = globalThis as unknown as { __sagwiseStore?: { signature: string; store: Promise<PhotoStore> } };

/** The configured store, made once per configuration (tests change the environment). */
export function photoStore(): Promise<PhotoStore> {
  const env = getEnv();
  const signature = env.S3_BUCKET ? `s3:${env.S3_ENDPOINT ?? ""}:${env.S3_BUCKET}` : `disk:${env.DATA_DIR}`;
  if (holder.__sagwiseStore?.signature !== signature) {
    const store = env.S3_BUCKET
      ? import("./s3").then((m) => m.createS3Store(env))
      : import("./disk").then((m) => m.createDiskStore());
    holder.__sagwiseStore = { signature, store };
  }
  return holder.__sagwiseStore.store;
}

/** Writes every photo, or none: a failure removes the ones already written. */
export async function writeUploads(photos: CheckedPhoto[]): Promise<StoredFile[]> {
  const store = await photoStore();
  const stored: StoredFile[] = [];
  try {
    for (const photo of photos) {
      const storageKey = `${randomUUID()}.${photo.ext}`;
      await store.put(storageKey, photo.bytes, photo.contentType);
      stored.push({ storageKey, sha256: sha256Hex(photo.bytes), sizeBytes: photo.bytes.byteLength });
    }
    return stored;
  } catch (error) {
    await removeUploads(stored.map((s) => s.storageKey));
    throw error;
  }
}

export async function removeUploads(keys: string[]): Promise<void> {
  const store = await photoStore();
  await Promise.all(keys.map((key) => store.remove(checkedKey(key))));
}

export async function readUpload(storageKey: string): Promise<Uint8Array> {
  return (await photoStore()).get(checkedKey(storageKey));
}
