// Rider photos: checked by their bytes (file-type), never by the name or the browser's type.
// HEIC is refused: nothing installed here can decode it (sharp's prebuilt libvips reads HEIF/AVIF
// but has no HEVC decoder), and a photo the shop cannot open is worse than a clear "convert it".
import { fileTypeFromBuffer } from "file-type";

import { MAX_PHOTOS, MAX_PHOTO_BYTES } from "./limits";

export { MAX_PHOTOS, MAX_PHOTO_BYTES };

export const PHOTO_TYPES = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
} as const;
export type PhotoContentType = keyof typeof PHOTO_TYPES;

export interface IncomingPhoto {
  originalName: string;
  bytes: Uint8Array;
}

export interface CheckedPhoto extends IncomingPhoto {
  contentType: PhotoContentType;
  ext: (typeof PHOTO_TYPES)[PhotoContentType];
}

export class PhotoError extends Error {
  constructor(
    readonly field: string,
    message: string,
    readonly status: 400 | 413 = 400,
  ) {
    super(message);
    this.name = "PhotoError";
  }
}

const isPhotoType = (mime: string): mime is PhotoContentType => mime in PHOTO_TYPES;

/** Names a photo in messages without echoing control characters or very long names. */
export function displayName(name: string): string {
  const clean = name
    .replace(/[\u0000-\u001f\u007f]/g, "")
    .trim()
    .slice(0, 120);
  return clean || "photo";
}

/** Checks count, size and content of every photo; throws PhotoError naming the first bad one. */
export async function checkPhotos(photos: IncomingPhoto[]): Promise<CheckedPhoto[]> {
  if (photos.length > MAX_PHOTOS) {
    throw new PhotoError("photos", `Send at most ${MAX_PHOTOS} photos (you chose ${photos.length}).`);
  }
  const checked: CheckedPhoto[] = [];
  for (const [i, photo] of photos.entries()) {
    const field = `photos.${i}`;
    const name = displayName(photo.originalName);
    if (photo.bytes.byteLength === 0) throw new PhotoError(field, `“${name}” is empty.`);
    if (photo.bytes.byteLength > MAX_PHOTO_BYTES) {
      const mb = (photo.bytes.byteLength / 1024 / 1024).toFixed(1);
      throw new PhotoError(field, `“${name}” is ${mb} MB; each photo may be at most 10 MB.`, 413);
    }
    const type = await fileTypeFromBuffer(photo.bytes);
    if (type && (type.mime === "image/heic" || type.mime === "image/heif" || type.ext === "heic")) {
      throw new PhotoError(
        field,
        `“${name}” is a HEIC photo, which the shop cannot open. Send it as JPEG (on most phones: share or export as “Most compatible”/JPEG).`,
      );
    }
    if (!type || !isPhotoType(type.mime)) {
      throw new PhotoError(field, `“${name}” is not a JPEG, PNG or WebP photo.`);
    }
    checked.push({ ...photo, originalName: name, contentType: type.mime, ext: PHOTO_TYPES[type.mime] });
  }
  return checked;
}
