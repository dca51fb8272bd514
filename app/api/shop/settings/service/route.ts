// PUT /api/shop/settings/service `{ noticeDays, timeZone, intervals }`: the service intervals per
// item and discipline, the reminder notice period and the shop's time zone (admin only).
import { saveServiceSettings } from "@/db/queries/service";
import { json, route } from "@/lib/api/route";
import { serviceSettingsSchema } from "@/lib/validations/service";
import { auditShop } from "../../_lib/audit";

export const PUT = route({ access: ["admin"], body: serviceSettingsSchema }, async ({ user, body }) => {
  const values = {
    noticeDays: body.noticeDays,
    timeZone: body.timeZone,
    intervals: body.intervals.map((i) => ({ ...i, months: i.months ?? null })),
  };
  await saveServiceSettings(values);
  await auditShop(user, "service.settings_saved", { intervals: values.intervals.length });
  return json(values);
});
