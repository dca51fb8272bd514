// POST /api/shop/team/invites/[id]: send an open invitation again, with a fresh link and 7 more days
// (the old link stops working). DELETE: withdraw it; its link stops working at once. Admin only,
// both in the audit log.
import { idParams, json, route } from "@/lib/api/route";
import { resendInvite, withdrawInvite } from "@/lib/auth/staff";
import { auditShop } from "../../../_lib/audit";

const notFound = "No such open invitation.";

export const POST = route({ access: ["admin"], params: idParams, notFound }, async ({ user, params }) => {
  const sent = await resendInvite(params.id, user);
  await auditShop(user, "staff.invite_resent", { email: sent.email, role: sent.role, mail: sent.mailStatus });
  return json(sent);
});

export const DELETE = route({ access: ["admin"], params: idParams, notFound }, async ({ user, params }) => {
  const withdrawn = await withdrawInvite(params.id);
  await auditShop(user, "staff.invite_revoked", { email: withdrawn.email });
  return json(withdrawn);
});
