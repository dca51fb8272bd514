// GET /api/requests: the staff queue, `{ items: [{ id, status, … }], total }` (+ `counts` per status
// with `counts=1`). Filters: status, discipline, bikeClass, tuner (user id | "me" | "unassigned"),
// from/to (UTC days), q (rider name, e-mail, bike); page, pageSize, sort.
import { NextResponse } from "next/server";
import { countRequestsByStatus, listQueue } from "@/db/queries/requests";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { queueParams, queueQuerySchema } from "@/lib/validations/queue";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  const caller = await requireRole(STAFF_ROLES, { headers: request.headers });
  const query = queueQuerySchema.parse(queueParams(new URL(request.url).searchParams));
  const [page, counts] = await Promise.all([
    listQueue(query, caller.id),
    query.counts ? countRequestsByStatus() : undefined,
  ]);
  return NextResponse.json(counts ? { ...page, counts } : page);
});
