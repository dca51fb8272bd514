// POST /api/shop/finishers `{ name, work, turnaroundDays }` (admin): an outside finisher the
// workshop sends parts to.
import { json, route } from "@/lib/api/route";
import { addFinisher } from "@/lib/orders/settings";
import { finisherSchema, orderErrors } from "@/lib/validations/orders";

export const POST = route(
  { access: ["admin"], body: finisherSchema, bodyErrors: orderErrors },
  async ({ user, body }) => json(await addFinisher(body, { userId: user.id, label: user.name }), 201),
);
