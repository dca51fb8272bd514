// GET /api/shop/orders-settings (admin) → `{ settings, priceList, finishers }`; PUT the settings
// `{ currency, taxRateBp, paymentMode, depositPercent, notifyStages, packingInstructions }`.
import { getOrderSettings, listFinishers, listPriceItems } from "@/db/queries/orders";
import { json, route } from "@/lib/api/route";
import { updateOrderSettings } from "@/lib/orders/settings";
import { orderErrors, orderSettingsSchema } from "@/lib/validations/orders";

export const dynamic = "force-dynamic";

export const GET = route({ access: ["admin"] }, async () =>
  json({ settings: await getOrderSettings(), priceList: await listPriceItems(), finishers: await listFinishers() }),
);

export const PUT = route(
  { access: ["admin"], body: orderSettingsSchema, bodyErrors: orderErrors },
  async ({ user, body }) => json(await updateOrderSettings(body, { userId: user.id, label: user.name })),
);
