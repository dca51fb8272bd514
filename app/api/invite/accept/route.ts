// POST /api/invite/accept { token, name, password }: public on purpose (the invitee has no account
// yet; the e-mailed token is the proof). Creates the staff account and signs the person in.
import { recordAudit } from "@/db/queries/audit";
import { clientHeaders } from "@/lib/api/client-address";
import { createLimiter } from "@/lib/api/rate-limit";
import { json, route } from "@/lib/api/route";
import { getAuth } from "@/lib/auth/server";
import { acceptInvite } from "@/lib/auth/staff";
import { acceptInviteSchema } from "@/lib/validations/team";

// An invitee accepts once; 10 tries per 15 minutes per address stops token guessing.
const limit = createLimiter("invite-accept", 10, 15 * 60);

export const POST = route({ access: "public", limit, body: acceptInviteSchema }, async ({ request, body }) => {
  const account = await acceptInvite(body);
  await recordAudit({
    actorUserId: account.id,
    actorLabel: body.name,
    action: "staff.joined",
    detail: { email: account.email, role: account.role },
  });
  const auth = await getAuth();
  const signedIn = await auth.api.signInEmail({
    body: { email: account.email, password: body.password },
    headers: clientHeaders(request),
    asResponse: true,
  });
  const response = json({ email: account.email, role: account.role }, 201);
  for (const cookie of signedIn.headers.getSetCookie()) response.headers.append("set-cookie", cookie);
  return response;
});
