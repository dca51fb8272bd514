// PUT /api/shop/price-list `{ items: [{ code, label, kind, unitPriceMinor, active, sortOrder }] }`
// (admin): adds or changes items by code. The app prices quotes with `service-<type>`,
// `spring-fork`, `spring-shock` and `shipping-return` (lib/orders/service.ts, PRICE_CODES).
import { z } from "zod";
import { json, route } from "@/lib/api/route";
import { savePriceList } from "@/lib/orders/settings";
import { orderErrors, priceItemSchema } from "@/lib/validations/orders";

const bodySchema = z.object({
  items: z.array(priceItemSchema, { error: "Send the price list as a list" }).max(200, "At most 200 items"),
});

export const PUT = route({ access: ["admin"], body: bodySchema, bodyErrors: orderErrors }, async ({ user, body }) =>
  json({ items: await savePriceList(body.items, { userId: user.id, label: user.name }) }),
);
