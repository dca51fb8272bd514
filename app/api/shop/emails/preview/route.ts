// POST /api/shop/emails/preview `{ template, heading, intro }`: the rider e-mail as it would be
// sent with this wording (the shop's name, demo data for the rest), nothing saved (admin only).
import { json, route } from "@/lib/api/route";
import { previewRiderEmail } from "@/lib/shop/email-wording";
import { emailWordingSchema } from "@/lib/validations/email-wording";

export const POST = route({ access: ["admin"], body: emailWordingSchema }, async ({ body }) =>
  json(await previewRiderEmail(body)),
);
