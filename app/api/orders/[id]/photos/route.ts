// POST /api/orders/[id]/photos (staff, multipart `photos`): check-in photos of the parts.
// GET /api/orders/[id]/photos?photo=<id> (staff): one of them, with the type sniffed at upload.
import { z } from "zod";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { TooLargeError, ValidationError } from "@/lib/errors";
import { addCheckInPhotos, readCheckInPhoto } from "@/lib/orders/photos";
import { MAX_PHOTO_BYTES, MAX_PHOTOS, PHOTO_TYPES, type IncomingPhoto, type PhotoContentType } from "@/lib/storage";
import { uuidSchema } from "@/lib/validations/id";

export const dynamic = "force-dynamic";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such order." },
  async ({ request, user, params }) => {
    if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data"))
      throw new ValidationError("Send the photos as a form upload.", { photos: "Choose a photo" });
    if (Number(request.headers.get("content-length") ?? 0) > MAX_PHOTOS * MAX_PHOTO_BYTES + 1024 * 1024)
      throw new TooLargeError(`At most ${MAX_PHOTOS} photos of 10 MB each.`, { photos: "Too large together" });
    const form = await request.formData().catch(() => {
      throw new ValidationError("The form data could not be read.", { photos: "Choose a photo" });
    });
    const photos: IncomingPhoto[] = [];
    for (const [i, file] of form.getAll("photos").entries()) {
      if (typeof file === "string") continue;
      if (file.size > MAX_PHOTO_BYTES)
        throw new TooLargeError("Each photo may be at most 10 MB.", { [`photos.${i}`]: "Larger than 10 MB" });
      photos.push({ originalName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
    }
    const rows = await addCheckInPhotos(params.id, photos, { userId: user.id, label: user.name });
    return json({ photos: rows.map((r) => ({ id: r.id, name: r.originalName })) }, 201);
  },
);

export const GET = route(
  {
    access: STAFF_ROLES,
    params: idParams,
    notFound: "No such order.",
    query: z.object({ photo: uuidSchema.optional() }),
  },
  async ({ params, query }) => {
    if (!query.photo) throw new ValidationError("Say which photo.", { photo: "Choose a photo" });
    const { photo, bytes } = await readCheckInPhoto(params.id, query.photo.toLowerCase());
    const isPhoto = photo.contentType in PHOTO_TYPES;
    return new Response(new Uint8Array(bytes), {
      headers: {
        "Content-Type": isPhoto ? (photo.contentType as PhotoContentType) : "application/octet-stream",
        "Content-Length": String(bytes.byteLength),
        "Content-Disposition": `${isPhoto ? "inline" : "attachment"}; filename="check-in-photo"`,
        "X-Content-Type-Options": "nosniff",
        "Cache-Control": "private, no-store",
        "Content-Security-Policy": "default-src 'none'; img-src 'self'; sandbox",
      },
    });
  },
);
