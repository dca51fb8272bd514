// GET /api/shop/stock: springs on the shelf. POST: add one (rate in any unit, stored in N/mm).
import { NextResponse } from "next/server";
import { createSpringStock, listSpringStock } from "@/db/queries/stock";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { springStockSchema } from "@/lib/validations/stock";
import { jsonBody } from "../_lib/body";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  return NextResponse.json({ items: await listSpringStock() });
});

export const POST = withErrors(async (request: Request) => {
  await requireRole(STAFF_ROLES, { headers: request.headers });
  const values = springStockSchema.parse(await jsonBody(request));
  return NextResponse.json(await createSpringStock(values), { status: 201 });
});
