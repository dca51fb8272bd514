// GET /api/requests/[id]/sheet?version=N[&token=T][&preview=1]: the setup sheet as a PDF.
// Staff see any version (a draft only as a watermarked preview); the request's rider, by the private
// link's token or by signing in with the request's e-mail, sees approved and superseded versions.
import { findSheetRequest, findSheetVersion } from "@/db/queries/sheet";
import { isRequestRider } from "@/lib/api/rider-access";
import { idParams, route } from "@/lib/api/route";
import { getSessionUser } from "@/lib/auth/guard";
import { isStaff } from "@/lib/auth/roles";
import { ConflictError, ForbiddenError, NotFoundError } from "@/lib/errors";
import { renderSetupSheet, sheetFileName } from "@/lib/pdf";
import { buildSheetData } from "@/lib/pdf/load-sheet";
import { sheetQuerySchema } from "@/lib/validations/sheet";

export const dynamic = "force-dynamic";

// Public on purpose: a rider's private link (token) opens it without a session; staff sessions see
// every request, a rider (token or own session) only their own, else 403 (401 with neither).
export const GET = route(
  { access: "public", params: idParams, notFound: "No such request.", query: sheetQuerySchema },
  async ({ request, params: { id }, query }) => {
    const user = await getSessionUser(request.headers);
    const staff = user !== null && isStaff(user.role);
    if (!staff && !(await isRequestRider(request, id, query.token, user)))
      throw new ForbiddenError(query.token ? "This link does not open that request." : "This request is not yours.");
    const setupRequest = await findSheetRequest(id);
    if (!setupRequest) throw new NotFoundError("No such request.");

    const version = await findSheetVersion(id, query.version);
    if (!version)
      throw new NotFoundError(`This request has no version ${query.version}.`, { version: "No such version" });
    const draft = version.state === "draft";
    if (draft && !staff) throw new ForbiddenError(`Version ${query.version} is not approved yet.`);
    if (draft && !query.preview)
      throw new ConflictError(`Version ${query.version} is a draft: open it as a preview (preview=1).`, {
        preview: "Needed for a draft",
      });

    const pdf = await renderSetupSheet(await buildSheetData(setupRequest, version, { draft }));
    return new Response(new Uint8Array(pdf), {
      status: 200,
      headers: {
        "content-type": "application/pdf",
        "content-length": String(pdf.length),
        "content-disposition": `inline; filename="${sheetFileName(setupRequest.number, version.version, draft)}"`,
        // Opened with a private token or a session: never kept by a shared cache.
        "cache-control": "private, no-store",
        "x-content-type-options": "nosniff",
      },
    });
  },
);
