// POST /api/shop/catalog/[id]/duplicate: a copy to edit into a sibling model ("… (copy)").
import { createBikeModel, getBikeModel, slugTaken } from "@/db/queries/bikes";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { NotFoundError } from "@/lib/errors";
import { bikeModelSchema } from "@/lib/validations/bike";
import { auditShop } from "../../../_lib/audit";

export const POST = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such bike model." },
  async ({ user, params }) => {
    const source = await getBikeModel(params.id);
    if (!source) throw new NotFoundError("No such bike model.");
    let slug = `${source.slug}-copy`.slice(0, 75);
    for (let n = 2; await slugTaken(slug); n++) slug = `${source.slug.slice(0, 70)}-copy-${n}`;
    const values = bikeModelSchema.parse({
      name: `${source.name} (copy)`.slice(0, 120),
      slug,
      bikeClass: source.bikeClass,
      yearFrom: source.yearFrom,
      yearTo: source.yearTo,
      notes: source.notes,
      spec: source.spec,
    });
    const row = await createBikeModel(values);
    await auditShop(user, "bike.duplicated", { id: row.id, from: source.id });
    return json(row, 201);
  },
);
