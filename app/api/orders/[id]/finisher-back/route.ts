// POST /api/orders/[id]/finisher-back `{ jobId, backOn? }` (staff): a part is back from its finisher.
import { z } from "zod";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { finisherBack } from "@/lib/orders/service";
import { finisherBackSchema, orderErrors } from "@/lib/validations/orders";

const bodySchema = finisherBackSchema.extend({ jobId: z.uuid({ error: "Choose the part that came back" }) });

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such order.", body: bodySchema, bodyErrors: orderErrors },
  async ({ user, params, body }) => {
    const job = await finisherBack(params.id, body.jobId, body.backOn, { userId: user.id, label: user.name });
    return json({ id: job.id, backOn: job.backOn });
  },
);
