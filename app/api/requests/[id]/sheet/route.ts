// GET /api/requests/[id]/sheet?version=N[&token=T][&preview=1]: the setup sheet as a PDF.
// Staff see any version (a draft only as a watermarked preview); the request's rider, by the private
// link's token or by signing in with the request's e-mail, sees approved and superseded versions.
import { NextResponse } from "next/server";
import { findSheetRequest, findSheetVersion } from "@/db/queries/sheet";
import { statusTokenOpens } from "@/db/queries/status-links";
import { HttpError, withErrors } from "@/lib/api/respond";
import { AuthError, getSessionUser, publicRoute } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { renderSetupSheet, sheetFileName } from "@/lib/pdf";
import { buildSheetData } from "@/lib/pdf/load-sheet";
import { sheetQuerySchema } from "@/lib/validations/sheet";

export const dynamic = "force-dynamic";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const forbidden = (error: string) => NextResponse.json({ error }, { status: 403 });

type Viewer = "staff" | "rider";

// Public on purpose: a rider's private link (token) opens it without a session; the checks below
// decide between staff, token holder and the rider's own session.
export const GET = publicRoute(withErrors(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const { id } = await params;
  const query = sheetQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));

  // The guard: a staff session, the request's private link, or the rider's own session.
  const user = await getSessionUser(request.headers);
  let viewer: Viewer | null = null;
  if (user && (STAFF_ROLES as readonly string[]).includes(user.role)) viewer = "staff";
  else if (query.token !== undefined) {
    if (!UUID.test(id) || !(await statusTokenOpens(query.token, id))) return forbidden("This link does not open that request.");
    viewer = "rider";
  } else if (!user) throw new AuthError(401);

  if (!UUID.test(id)) throw new HttpError(404, "No such request.");
  const setupRequest = await findSheetRequest(id);
  if (!setupRequest) {
    if (viewer === "staff") throw new HttpError(404, "No such request.");
    return forbidden("This request is not yours.");
  }
  if (!viewer) {
    // Signed in, not staff: only the rider whose e-mail the request carries.
    if (user!.email.toLowerCase() !== setupRequest.riderEmail.toLowerCase()) return forbidden("This request is not yours.");
    viewer = "rider";
  }

  const version = await findSheetVersion(id, query.version);
  if (!version) throw new HttpError(404, `This request has no version ${query.version}.`, { version: "No such version" });
  const draft = version.state === "draft";
  if (draft && viewer === "rider") return forbidden(`Version ${query.version} is not approved yet.`);
  if (draft && !query.preview) {
    throw new HttpError(409, `Version ${query.version} is a draft: open it as a preview (preview=1).`, { preview: "Needed for a draft" });
  }

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
}));
