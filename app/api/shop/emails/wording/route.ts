// GET/PUT /api/shop/emails/wording: the shop's own heading and opening paragraph of each rider
// e-mail (admin only). PUT `{ template, heading, intro }`; empty fields go back to the template's words.
import { json, route } from "@/lib/api/route";
import { listRiderEmailWording, saveRiderEmailWording } from "@/lib/shop/email-wording";
import { emailWordingSchema } from "@/lib/validations/email-wording";

export const dynamic = "force-dynamic";

export const GET = route({ access: ["admin"] }, async () => json(await listRiderEmailWording()));

export const PUT = route({ access: ["admin"], body: emailWordingSchema }, async ({ user, body }) =>
  json(await saveRiderEmailWording(user, body)),
);
