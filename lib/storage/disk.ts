// Photos on the local disk under DATA_DIR/uploads: one instance (or several sharing that folder).
import { mkdir, open, readFile, rename, rm } from "node:fs/promises";
import path from "node:path";
import { getEnv } from "@/lib/env";
import { checkedKey, type PhotoStore } from "./store";

export function uploadsDir(): string {
  return path.resolve(getEnv().DATA_DIR, "uploads");
}

function pathOf(storageKey: string): string {
  return path.join(uploadsDir(), checkedKey(storageKey));
}

export function createDiskStore(): PhotoStore {
  return {
    kind: "disk",
    /** Durably: temp file, fsync, rename, fsync of the folder. */
    async put(storageKey, bytes) {
      const dir = uploadsDir();
      await mkdir(dir, { recursive: true });
      const final = pathOf(storageKey);
      const temp = `${final}.part`;
      const handle = await open(temp, "wx", 0o600);
      try {
        await handle.writeFile(bytes);
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
    },
    async get(storageKey) {
      return new Uint8Array(await readFile(pathOf(storageKey)));
    },
    async remove(storageKey) {
      await rm(pathOf(storageKey), { force: true });
    },
  };
}
