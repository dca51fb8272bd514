// Uploads on disk under DATA_DIR/uploads. Keys are generated here (uuid + extension from the
// sniffed type), never derived from what the rider sent, so no name can reach the file system.
import { createHash, randomUUID } from "node:crypto";
import { mkdir, open, readFile, rename, rm } from "node:fs/promises";
import path from "node:path";
import { getEnv } from "@/lib/env";
import type { CheckedPhoto } from "./photos";

export interface StoredFile {
  storageKey: string;
  sha256: string;
  sizeBytes: number;
}

const KEY_PATTERN = /^[0-9a-f-]{36}\.(jpg|png|webp)$/;

export function uploadsDir(): string {
  return path.resolve(getEnv().DATA_DIR, "uploads");
}

function pathOf(storageKey: string): string {
  if (!KEY_PATTERN.test(storageKey)) throw new Error(`Bad storage key ${storageKey}`);
  return path.join(uploadsDir(), storageKey);
}

export function sha256Hex(bytes: Uint8Array): string {
  return createHash("sha256").update(bytes).digest("hex");
}

/** Writes one file durably: temp file, fsync, rename, fsync of the folder. */
export async function writeUpload(photo: CheckedPhoto): Promise<StoredFile> {
  const dir = uploadsDir();
  await mkdir(dir, { recursive: true });
  const storageKey = `${randomUUID()}.${photo.ext}`;
  const final = pathOf(storageKey);
  const temp = `${final}.part`;
  const handle = await open(temp, "wx", 0o600);
  try {
    await handle.writeFile(photo.bytes);
    await handle.sync();
  } finally {
    await handle.close();
  }
  await rename(temp, final);
  const dirHandle = await open(dir, "r");
  try {
    await dirHandle.sync();
  } finally {
    await dirHandle.close();
  }
  return { storageKey, sha256: sha256Hex(photo.bytes), sizeBytes: photo.bytes.byteLength };
}

/** Writes every photo, or none: a failure removes the ones already written. */
export async function writeUploads(photos: CheckedPhoto[]): Promise<StoredFile[]> {
  const stored: StoredFile[] = [];
  try {
    for (const photo of photos) stored.push(await writeUpload(photo));
    return stored;
  } catch (error) {
    await removeUploads(stored.map((s) => s.storageKey));
    throw error;
  }
}

export async function removeUploads(keys: string[]): Promise<void> {
  await Promise.all(keys.map((key) => rm(pathOf(key), { force: true })));
}

export async function readUpload(storageKey: string): Promise<Buffer> {
  return readFile(pathOf(storageKey));
}
