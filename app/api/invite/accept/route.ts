// POST /api/invite/accept { token, name, password }: public on purpose (the invitee has no account
// yet; the e-mailed token is the proof). Creates the staff account and signs the person in.
import { NextResponse } from "next/server";
import { recordAudit } from "@/db/queries/audit";
import { clientHeaders } from "@/lib/api/client-address";
import { createLimiter } from "@/lib/api/rate-limit";
import { HttpError, withErrors } from "@/lib/api/respond";
import { publicRoute } from "@/lib/auth/guard";
import { getAuth } from "@/lib/auth/server";
import { acceptInvite } from "@/lib/auth/staff";
import { acceptInviteSchema } from "@/lib/validations/team";

// An invitee accepts once; 10 tries per 15 minutes per address stops token guessing.
const limit = createLimiter("invite-accept", 10, 15 * 60);

export const POST = publicRoute(
  withErrors(async (request: Request) => {
    await limit(request);
    let body: unknown;
    try {
      body = await request.json();
    } catch {
      throw new HttpError(400, "Send the form as JSON.");
    }
    const input = acceptInviteSchema.parse(body);
    const account = await acceptInvite(input);
    await recordAudit({ actorUserId: account.id, actorLabel: input.name, action: "staff.joined", detail: { email: account.email, role: account.role } });
    const auth = await getAuth();
    const signedIn = await auth.api.signInEmail({
      body: { email: account.email, password: input.password },
      headers: clientHeaders(request),
      asResponse: true,
    });
    const response = NextResponse.json({ email: account.email, role: account.role }, { status: 201 });
    for (const cookie of signedIn.headers.getSetCookie()) response.headers.append("set-cookie", cookie);
    return response;
  }),
);
