// PATCH /api/shop/team/[id] { role?, active? }: change a role or (de)activate (admin only).
// Deactivation ends the person's sessions at once; the last active admin can be neither demoted
// nor deactivated (409).
import { z } from "zod";
import { json, route } from "@/lib/api/route";
import { updateStaffMember } from "@/lib/auth/staff";
import { ConflictError } from "@/lib/errors";
import { memberUpdateSchema } from "@/lib/validations/team";
import { auditShop } from "../../_lib/audit";

// better-auth user ids are opaque strings, not uuids.
const memberParams = z.object({ id: z.string().min(1).max(100) });

export const PATCH = route(
  { access: ["admin"], params: memberParams, notFound: "No such team member.", body: memberUpdateSchema },
  async ({ request, user, params: { id }, body: change }) => {
    if (id === user.id && change.active === false)
      throw new ConflictError("You cannot deactivate your own account.", { active: "Your own account" });
    const member = await updateStaffMember(id, change, request.headers);
    await auditShop(user, "staff.changed", { userId: id, ...change });
    return json(member);
  },
);
