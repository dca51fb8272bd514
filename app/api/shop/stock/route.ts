// GET /api/shop/stock: springs on the shelf. POST: add one (rate in any unit, stored in N/mm).
import { createSpringStock, listSpringStock } from "@/db/queries/stock";
import { json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { springStockSchema } from "@/lib/validations/stock";

export const dynamic = "force-dynamic";

export const GET = route({ access: STAFF_ROLES }, async () => json({ items: await listSpringStock() }));

export const POST = route({ access: STAFF_ROLES, body: springStockSchema }, async ({ body }) =>
  json(await createSpringStock(body), 201),
);
