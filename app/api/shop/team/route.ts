// GET /api/shop/team: staff and open invitations. POST { email, role }: invite someone (admin only);
// the link goes out by e-mail, its token is stored only as SHA-256.
import { NextResponse } from "next/server";
import { listOpenInvites } from "@/db/queries/invites";
import { listStaff } from "@/db/queries/team";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { inviteStaff } from "@/lib/auth/staff";
import { inviteSchema } from "@/lib/validations/team";
import { jsonBody } from "../_lib/body";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = withErrors(async (request: Request) => {
  await requireRole(["admin"], { headers: request.headers });
  const [members, invites] = await Promise.all([listStaff(), listOpenInvites()]);
  return NextResponse.json({ members, invites });
});

export const POST = withErrors(async (request: Request) => {
  const admin = await requireRole(["admin"], { headers: request.headers });
  const input = inviteSchema.parse(await jsonBody(request));
  const invited = await inviteStaff(input, admin);
  await auditShop(admin, "staff.invited", { email: invited.email, role: invited.role, mail: invited.mailStatus });
  return NextResponse.json(invited, { status: 201 });
});
