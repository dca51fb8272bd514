// POST /api/orders/[id]/finishers `{ finisherId, part, sentOn, dueOn? }` (staff): a part goes out to
// a finisher (due date from the finisher's usual turnaround when not given).
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { sendToFinisher } from "@/lib/orders/service";
import { finisherOutSchema, orderErrors } from "@/lib/validations/orders";

export const POST = route(
  {
    access: STAFF_ROLES,
    params: idParams,
    notFound: "No such order.",
    body: finisherOutSchema,
    bodyErrors: orderErrors,
  },
  async ({ user, params, body }) => {
    const job = await sendToFinisher(params.id, body, { userId: user.id, label: user.name });
    return json({ id: job.id, dueOn: job.dueOn }, 201);
  },
);
