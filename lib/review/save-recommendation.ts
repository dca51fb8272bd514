// Saving a tuner's adjustments as a draft version. The server recomputes the recommendation from the
// version's stored input and the overrides (never trusting figures from the browser); a draft is
// updated in place, an approved latest version gets a new draft after it ("revising after approval").
import { recordAudit } from "@/db/queries/audit";
import { insertVersion, updateDraftVersion } from "@/db/queries/review-steps";
import { inTransaction } from "@/db/queries/transaction";
import { getLatestVersion } from "@/db/queries/versions";
import { ConflictError, ValidationError } from "@/lib/errors";
import { outOfBikeRange } from "@/lib/review/override-bounds";
import { compactOverrides, diffOverrides } from "@/lib/review/overrides-diff";
import { ALLOWED_FROM } from "@/lib/review/transitions";
import { SizingInputError, evaluateSetup, type SetupOverrides, type SizingInput } from "@/lib/sizing";
import type { SaveRecommendationBody } from "@/lib/validations/review";
import { assertCanStart, auditBy, lockRequest, moveStatus, type Actor } from "./workflow";

function recompute(input: SizingInput, overrides: SetupOverrides) {
  try {
    return evaluateSetup(input, overrides);
  } catch (error) {
    if (!(error instanceof SizingInputError)) throw error;
    const fields = Object.fromEntries(error.issues.map((i) => [i.path, i.message]));
    throw new ValidationError("These figures cannot be used.", fields);
  }
}

export async function saveRecommendationDraft(requestId: string, body: SaveRecommendationBody, actor: Actor) {
  const overrides = compactOverrides(body.overrides);
  return inTransaction(async (tx) => {
    const req = await lockRequest(tx, requestId);
    assertCanStart("save", req.status);
    const latest = await getLatestVersion(requestId, tx);
    if (!latest) throw new ConflictError("This request has no recommendation to adjust yet.");
    if (latest.version !== body.basedOnVersion)
      throw new ConflictError(
        `Version ${latest.version} was saved meanwhile (you edited version ${body.basedOnVersion}). Reload to see it; your edits are still on screen.`,
      );
    const outside = outOfBikeRange(latest.input, overrides);
    if (Object.keys(outside).length)
      throw new ValidationError(
        "Some figures are outside this bike's ranges.",
        Object.fromEntries(Object.entries(outside).map(([path, message]) => [`overrides.${path}`, message])),
      );
    const output = recompute(latest.input, overrides);
    const changes = diffOverrides(latest.overrides, overrides);
    const notesForRider = body.notesForRider || null;
    const internalNotes = body.internalNotes || null;
    const notesChanged = {
      notesForRider: (latest.notesForRider ?? null) !== notesForRider,
      internalNotes: (latest.internalNotes ?? null) !== internalNotes,
    };
    const now = new Date();
    let version = latest.version;
    if (latest.state === "draft") {
      await updateDraftVersion(tx, latest.id, {
        output,
        overrides,
        notesForRider,
        internalNotes,
        engineVersion: output.engineVersion,
      });
    } else {
      version = latest.version + 1;
      await insertVersion(tx, {
        requestId,
        version,
        state: "draft",
        engineVersion: output.engineVersion,
        input: latest.input,
        output,
        overrides,
        notesForRider,
        internalNotes,
        createdById: actor.id,
        createdAt: now,
        updatedAt: now,
      });
    }
    // Working on a new or approved request puts it (back) in review; waiting for the rider stays.
    const events =
      req.status === "submitted" || req.status === "approved"
        ? await moveStatus(tx, requestId, req.status, ALLOWED_FROM.save, "in_review", actor)
        : [];
    events.push(
      auditBy(actor, requestId, "recommendation.saved", {
        version,
        newVersion: version !== latest.version,
        changes,
        ...(notesChanged.notesForRider
          ? { notesForRider: { from: latest.notesForRider ?? null, to: notesForRider } }
          : {}),
        ...(notesChanged.internalNotes ? { internalNotesChanged: true } : {}),
      }),
    );
    await recordAudit(events, tx);
    return { version, state: "draft" as const, newVersion: version !== latest.version, changes, output };
  });
}
