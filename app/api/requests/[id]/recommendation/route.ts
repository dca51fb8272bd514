// PATCH /api/requests/[id]/recommendation (staff): saves the tuner's overrides and notes as a draft
// version, recomputed on the server. Body: { basedOnVersion, overrides, notesForRider?, internalNotes? }.
import { saveRecommendationDraft } from "@/lib/review/save-recommendation";
import { idParams, json, route } from "@/lib/api/route";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { saveRecommendationSchema } from "@/lib/validations/review";

export const PATCH = route(
  { access: STAFF_ROLES, params: idParams, notFound: "No such request.", body: saveRecommendationSchema },
  async ({ user, params, body }) => json(await saveRecommendationDraft(params.id, body, user)),
);
