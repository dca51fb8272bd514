// POST /api/shop/catalog/[id]/retire { retired }: retire a model or bring it back. A retired model
// leaves the rider's picker but stays readable on the requests that used it (nothing is deleted).
import { setBikeModelRetired } from "@/db/queries/bikes";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import { retireSchema } from "@/lib/validations/bike";
import { auditShop } from "../../../_lib/audit";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such bike model.", body: retireSchema },
  async ({ user, params: { id }, body: { retired } }) => {
    const row = await setBikeModelRetired(id, retired);
    if (!row) throw new NotFoundError("No such bike model.");
    await auditShop(user, retired ? "bike.retired" : "bike.restored", { id });
    return json(row);
  },
);
