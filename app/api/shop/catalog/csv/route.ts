// GET /api/shop/catalog/csv: every model (retired too) as CSV. POST: import a CSV (text/csv body or
// multipart field `file`); each row is validated and saved on its own, so a bad row never stops the
// good ones, and the answer reports every refused row with its fields and reasons.
import { listAllBikeModels, upsertBikeModelBySlug } from "@/db/queries/bikes";
import { json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { TooLargeError, ValidationError } from "@/lib/errors";
import { catalogToCsv, parseCatalogCsv } from "@/lib/validations/bike-csv";
import { auditShop } from "../../_lib/audit";
import { isoDay } from "@/lib/format";

export const dynamic = "force-dynamic";

/** 2 MB is thousands of models; more is a wrong file. */
const MAX_BYTES = 2 * 1024 * 1024;

export const GET = route({ access: STAFF_ROLES }, async () => {
  const csv = catalogToCsv(await listAllBikeModels());
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="sagwise-catalog-${isoDay(new Date())}.csv"`,
    },
  });
});

async function csvText(request: Request): Promise<string> {
  const type = request.headers.get("content-type") ?? "";
  if (type.startsWith("multipart/form-data")) {
    const form = await request.formData().catch(() => {
      throw new ValidationError("The upload could not be read.", { file: "Choose the file again" });
    });
    const file = form.get("file");
    if (!(file instanceof Blob)) throw new ValidationError("Choose a CSV file.", { file: "Choose a CSV file" });
    if (file.size > MAX_BYTES) throw new TooLargeError("The file is larger than 2 MB.", { file: "Larger than 2 MB" });
    return file.text();
  }
  const text = await request.text();
  if (text.length > MAX_BYTES) throw new TooLargeError("The file is larger than 2 MB.", { file: "Larger than 2 MB" });
  return text;
}

// The body is a CSV file, not JSON: read here rather than by a body schema.
export const POST = route({ access: STAFF_ROLES }, async ({ request, user }) => {
  const { results, fileError } = parseCatalogCsv(await csvText(request));
  if (fileError) throw new ValidationError(fileError, { file: fileError });
  const saved: { row: number; slug: string; action: "created" | "updated" }[] = [];
  const refused: { row: number; slug: string | null; fields: Record<string, string> }[] = [];
  for (const r of results) {
    if (!r.ok) {
      refused.push({ row: r.row, slug: r.slug, fields: r.fields });
      continue;
    }
    try {
      saved.push({ row: r.row, slug: r.slug, action: await upsertBikeModelBySlug(r.values, r.retired) });
    } catch (error) {
      console.error("[catalog import] row", r.row, error);
      refused.push({ row: r.row, slug: r.slug, fields: { _: "Could not be saved" } });
    }
  }
  await auditShop(user, "catalog.imported", { saved: saved.length, refused: refused.length });
  return json({ saved, refused });
});
