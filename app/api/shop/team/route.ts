// GET /api/shop/team: staff and open invitations. POST { email, role }: invite someone (admin only);
// the link goes out by e-mail, its token is stored only as SHA-256.
import { listOpenInvites } from "@/db/queries/invites";
import { listStaff } from "@/db/queries/team";
import { json, route } from "@/lib/api/route";
import { inviteStaff } from "@/lib/auth/staff";
import { inviteSchema } from "@/lib/validations/team";
import { auditShop } from "../_lib/audit";

export const dynamic = "force-dynamic";

export const GET = route({ access: ["admin"] }, async () => {
  const [members, invites] = await Promise.all([listStaff(), listOpenInvites()]);
  return json({ members, invites });
});

export const POST = route({ access: ["admin"], body: inviteSchema }, async ({ user, body }) => {
  const invited = await inviteStaff(body, user);
  await auditShop(user, "staff.invited", { email: invited.email, role: invited.role, mail: invited.mailStatus });
  return json(invited, 201);
});
