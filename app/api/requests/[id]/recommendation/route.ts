// PATCH /api/requests/[id]/recommendation (staff): saves the tuner's overrides and notes as a draft
// version, recomputed on the server. Body: { basedOnVersion, overrides, notesForRider?, internalNotes? }.
import { NextResponse } from "next/server";
import { saveRecommendationDraft } from "@/db/queries/save-recommendation";
import { withErrors } from "@/lib/api/respond";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { jsonBody, requestIdFrom, type IdContext } from "@/lib/review/route-input";
import { saveRecommendationSchema } from "@/lib/validations/review";

export const PATCH = withErrors(async (request: Request, context: IdContext) => {
  const actor = await requireRole(STAFF_ROLES, { headers: request.headers });
  const id = await requestIdFrom(context);
  const body = await jsonBody(request, saveRecommendationSchema);
  const saved = await saveRecommendationDraft(id, body, actor);
  return NextResponse.json(saved);
});
