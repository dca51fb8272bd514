// Check-in photos of an order's parts, kept in the same photo store as the riders' photos
// (lib/storage: sniffed type, generated keys, disk or S3), recorded per order and audited.
import { recordAudit } from "@/db/queries/audit";
import { findOrder, findOrderPhoto, insertOrderPhoto } from "@/db/queries/orders";
import { inTransaction } from "@/db/queries/transaction";
import { NotFoundError, TooLargeError, ValidationError } from "@/lib/errors";
import {
  checkPhotos,
  MAX_PHOTOS,
  PhotoError,
  readUpload,
  removeUploads,
  writeUploads,
  type IncomingPhoto,
} from "@/lib/storage";
import type { OrderActor } from "./notify";
import { auditOrder } from "./service";

export async function addCheckInPhotos(orderId: string, photos: IncomingPhoto[], actor: OrderActor) {
  const order = await findOrder(orderId);
  if (!order) throw new NotFoundError("No such order.");
  if (!photos.length) throw new ValidationError("Choose at least one photo.", { photos: "Choose a photo" });
  if (photos.length > MAX_PHOTOS)
    throw new ValidationError(`Send at most ${MAX_PHOTOS} photos at once.`, { photos: `At most ${MAX_PHOTOS}` });
  let checked;
  try {
    checked = await checkPhotos(photos);
  } catch (error) {
    if (!(error instanceof PhotoError)) throw error;
    const fields = { [error.field]: error.message };
    throw error.status === 413 ? new TooLargeError(error.message, fields) : new ValidationError(error.message, fields);
  }
  const stored = await writeUploads(checked);
  try {
    return await inTransaction(async (tx) => {
      const rows = [];
      for (const [i, file] of stored.entries())
        rows.push(
          await insertOrderPhoto(
            {
              orderId,
              storageKey: file.storageKey,
              sha256: file.sha256,
              sizeBytes: file.sizeBytes,
              originalName: checked[i]!.originalName,
              contentType: checked[i]!.contentType,
            },
            tx,
          ),
        );
      await recordAudit(auditOrder(actor, order, "order.photos_added", { count: rows.length }), tx);
      return rows;
    });
  } catch (error) {
    await removeUploads(stored.map((s) => s.storageKey));
    throw error;
  }
}

export async function readCheckInPhoto(orderId: string, photoId: string) {
  const photo = await findOrderPhoto(orderId, photoId);
  if (!photo) throw new NotFoundError("No such photo.");
  try {
    return { photo, bytes: await readUpload(photo.storageKey) };
  } catch (error) {
    if ((error as { code?: string }).code === "ENOENT")
      throw new NotFoundError("The photo's file is missing from storage.");
    throw error;
  }
}
