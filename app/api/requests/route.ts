// GET /api/requests: the staff queue, `{ items: [{ id, status, … }], total }`.
import { NextResponse } from "next/server";
import { listQueue } from "@/db/queries/requests";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { queueQuerySchema } from "@/lib/validations/queue";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const params = Object.fromEntries(new URL(request.url).searchParams);
  const query = queueQuerySchema.parse(params);
  return NextResponse.json(await listQueue(query));
});
