// After the first rides: the rider says how the bike rides now (complaints per end, own words) on
// the status page; the engine's clicker rules propose the next step from the fitted setup (the
// approved version's positions, lib/sizing proposeClickerChanges) with the shop's own rules as the
// version stored them, each move with its reason. The tuner sees it on the request.
import { findApprovedVersion } from "@/db/queries/status";
import { insertRideFeedback } from "@/db/queries/ride-feedback";
import { ConflictError } from "@/lib/errors";
import { proposeClickerChanges, recommendationSchema, sizingDefaults } from "@/lib/sizing";
import type { z } from "zod";
import type { rideFeedbackSchema } from "@/lib/validations/ride-feedback";

export async function reportRideFeedback(requestId: string, body: z.output<typeof rideFeedbackSchema>) {
  const approved = await findApprovedVersion(requestId);
  if (!approved) throw new ConflictError("You can tell us how it rides once the shop has approved your setup.");
  const output = recommendationSchema.parse(approved.output);
  const rules = approved.input.clickerRules ?? sizingDefaults.DEFAULT_CLICKER_RULES;
  const proposal = proposeClickerChanges(output.clickers, rules, { front: body.front, rear: body.rear });
  const row = await insertRideFeedback({
    requestId,
    versionId: approved.id,
    version: approved.version,
    front: body.front,
    rear: body.rear,
    notes: body.notes || null,
    proposal,
  });
  return { id: row.id, createdAt: row.createdAt, version: row.version, proposal };
}
