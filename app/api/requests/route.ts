// GET /api/requests: the staff queue, `{ items: [{ id, status, … }], total }` (+ `counts` per status
// with `counts=1`). Filters: status, discipline, bikeClass, tuner (user id | "me" | "unassigned"),
// from/to (UTC days), q (rider name, e-mail, bike, or the request's number); page, pageSize, sort.
// Each item carries `notices`: the kinds of its unseen staff notices (lib/notify-staff.ts).
// POST /api/requests: a rider's new setup request (public), 201 `{ id, statusUrl }`.
import { z } from "zod";
import { listUnseenNoticeKinds } from "@/db/queries/notices";
import { countRequestsByStatus, listQueue } from "@/db/queries/requests";
import { HttpError } from "@/lib/api/respond";
import { createLimiter } from "@/lib/api/rate-limit";
import { json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { TooLargeError, ValidationError } from "@/lib/errors";
import { submitSetupRequest } from "@/lib/requests/intake";
import { statusPath } from "@/lib/requests/token";
import { MAX_PHOTO_BYTES, MAX_PHOTOS, PhotoError, displayName, type IncomingPhoto } from "@/lib/storage";
import { queueParams, queueQuerySchema } from "@/lib/validations/queue";
import { friendlyError } from "@/lib/validations/messages";
import { requestAnswersSchema } from "@/lib/validations/request";

export const dynamic = "force-dynamic";

// Empty filters (a cleared field) mean "no filter".
const queueQuery = z.preprocess(
  (raw) => queueParams(new URLSearchParams(raw as Record<string, string>)),
  queueQuerySchema,
);

export const GET = route({ access: STAFF_ROLES, query: queueQuery }, async ({ user, query }) => {
  const [page, counts] = await Promise.all([
    listQueue(query, user.id),
    query.counts ? countRequestsByStatus() : undefined,
  ]);
  // The marks in the queue: each row's unseen notices (a new request, an answer, a sag report…).
  const unseen = await listUnseenNoticeKinds(page.items.map((i) => i.id));
  const items = page.items.map((i) => ({ ...i, notices: unseen.get(i.id) ?? [] }));
  return json(counts ? { ...page, items, counts } : { ...page, items });
});

// A rider sends one request, maybe a corrected second: 8 per 15 minutes per client stops floods
// without getting in the way of a real rider.
const limitSubmissions = createLimiter("submit", 8, 15 * 60);

const bad = (field: string, message: string, status: 400 | 413 = 400) =>
  status === 413
    ? new TooLargeError(message, { [field]: message })
    : new ValidationError(message, { [field]: message });

async function readBody(request: Request): Promise<{ answers: unknown; photos: IncomingPhoto[] }> {
  const type = request.headers.get("content-type") ?? "";
  if (type.startsWith("multipart/form-data")) {
    // The whole form is read into memory: refuse a body larger than 6 full-size photos up front.
    const declared = Number(request.headers.get("content-length") ?? 0);
    if (declared > MAX_PHOTOS * MAX_PHOTO_BYTES + 1024 * 1024) {
      throw bad("photos", `The photos are too large together: at most ${MAX_PHOTOS} photos of 10 MB each.`, 413);
    }
    const form = await request.formData().catch(() => {
      throw bad("_", "The form data could not be read.");
    });
    const raw = form.get("answers");
    if (typeof raw !== "string") throw bad("answers", "The answers are missing.");
    let answers: unknown;
    try {
      answers = JSON.parse(raw);
    } catch {
      throw bad("answers", "The answers are not valid JSON.");
    }
    const files = form.getAll("photos").filter((f): f is File => typeof f !== "string");
    if (files.length > MAX_PHOTOS)
      throw bad("photos", `Send at most ${MAX_PHOTOS} photos (you chose ${files.length}).`);
    const photos: IncomingPhoto[] = [];
    for (const [i, file] of files.entries()) {
      // Refuse by the declared size before reading a large file into memory.
      if (file.size > MAX_PHOTO_BYTES)
        throw bad(
          `photos.${i}`,
          `“${displayName(file.name)}” is ${(file.size / 1048576).toFixed(1)} MB; each photo may be at most 10 MB.`,
          413,
        );
      photos.push({ originalName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
    }
    return { answers, photos };
  }
  if (type.startsWith("application/json")) {
    const answers = await request.json().catch(() => {
      throw bad("_", "The request body is not valid JSON.");
    });
    return { answers, photos: [] };
  }
  throw new HttpError(415, "Send the answers as application/json or multipart/form-data.");
}

// Public on purpose: riders send requests without an account. The body is JSON or multipart (with
// photos), so it is read here rather than by a body schema.
export const POST = route({ access: "public", limit: limitSubmissions }, async ({ request }) => {
  const body = await readBody(request);
  const answers = requestAnswersSchema.parse(body.answers, { error: friendlyError });
  let created;
  try {
    created = await submitSetupRequest(answers, body.photos);
  } catch (error) {
    if (error instanceof PhotoError) throw bad(error.field, error.message, error.status);
    throw error;
  }
  // Committed with its confirmation e-mail queued; the outbox worker sends it (no waiting here).
  return json({ id: created.id, statusUrl: statusPath(created.statusToken) }, 201);
});
