// POST /api/orders/[id]/check-in `{ serials: [{ part, serial }], conditionNotes }` (staff): a send-in
// order's parts arrived; moves it to "received".
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { checkIn } from "@/lib/orders/service";
import { checkInSchema, orderErrors } from "@/lib/validations/orders";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such order.", body: checkInSchema, bodyErrors: orderErrors },
  async ({ user, params, body }) => {
    const order = await checkIn(params.id, body, { userId: user.id, label: user.name });
    return json({ id: order.id, stage: order.stage });
  },
);
