// The tuner's one step after the rider's feedback: the approved version's overrides plus the
// proposed clicker positions become a new version, approved at once and e-mailed to the rider as a
// revised sheet (the usual save and approve, so every check and audit entry still applies).
import { findRideFeedback, markRideFeedbackRevised } from "@/db/queries/ride-feedback";
import { getLatestVersion } from "@/db/queries/versions";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { saveRecommendationDraft } from "./save-recommendation";
import { approveRecommendation, type Actor } from "./workflow";

export async function sendRideRevision(requestId: string, feedbackId: string, actor: Actor) {
  const feedback = await findRideFeedback(requestId, feedbackId);
  if (!feedback) throw new NotFoundError("No such feedback on this request.");
  if (feedback.revisedVersion !== null)
    throw new ConflictError(`This feedback was answered with version ${feedback.revisedVersion} already.`);
  if (!feedback.proposal.changes.some((c) => c.to !== c.from))
    throw new ConflictError("The rules propose no clicker change for this feedback: adjust the setup by hand.");
  const latest = await getLatestVersion(requestId);
  if (!latest || latest.state !== "approved" || latest.version !== feedback.version)
    throw new ConflictError(
      `The feedback is about version ${feedback.version}, and the request has moved on since. Revise it by hand.`,
    );
  const clickers = { ...(latest.overrides?.clickers ?? {}) };
  for (const c of feedback.proposal.changes) clickers[c.id] = c.to;
  const saved = await saveRecommendationDraft(
    requestId,
    {
      basedOnVersion: latest.version,
      overrides: { ...(latest.overrides ?? {}), clickers },
      notesForRider: latest.notesForRider ?? "",
      internalNotes: latest.internalNotes ?? "",
    },
    actor,
  );
  // The warnings the tuner acknowledged on the fitted version stay acknowledged; a new one stops here.
  const acknowledged = (latest.output.warnings ?? []).filter((w) => w.requiresAcknowledgement).map((w) => w.code);
  const approved = await approveRecommendation(requestId, actor, saved.version, acknowledged);
  await markRideFeedbackRevised(feedback.id, approved.version);
  return { version: approved.version };
}
