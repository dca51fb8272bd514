// PUT /api/shop/catalog/[id]/build-notes `{ buildNotes }` (staff): the workshop's build notes of a
// catalog model, printed on every build sheet for that model.
import { z } from "zod";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { changeBuildNotes } from "@/lib/orders/settings";
import { orderErrors } from "@/lib/validations/orders";
import { text } from "@/lib/validations/text";

const bodySchema = z.object({
  buildNotes: text().trim().max(8000, "Keep the build notes under 8000 characters"),
});

export const PUT = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such bike model.", body: bodySchema, bodyErrors: orderErrors },
  async ({ user, params, body }) => {
    await changeBuildNotes(params.id, body.buildNotes || null, { userId: user.id, label: user.name });
    return json({ buildNotes: body.buildNotes || null });
  },
);
