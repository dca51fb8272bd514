// PATCH /api/shop/finishers/[id] `{ name?, work?, turnaroundDays?, active? }` (admin).
import { idParams, json, route } from "@/lib/api/route";
import { changeFinisher } from "@/lib/orders/settings";
import { finisherSchema, orderErrors } from "@/lib/validations/orders";

export const PATCH = route(
  {
    access: ["admin"],
    params: idParams,
    notFound: "No such finisher.",
    body: finisherSchema.partial(),
    bodyErrors: orderErrors,
  },
  async ({ user, params, body }) => json(await changeFinisher(params.id, body, { userId: user.id, label: user.name })),
);
