// What the setup sheet route needs: the request, one of its versions with the approver's name, and
// the shop. Scoped by request id AND version, so one request's token never reaches another's data.
import { and, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { getDb } from "@/db/client";
import { bikeModels, recommendationVersions, setupRequests, user } from "@/db/schema";

export async function findSheetRequest(requestId: string) {
  const db = await getDb();
  const [row] = await db
    .select({
      id: setupRequests.id,
      number: setupRequests.number,
      riderName: setupRequests.riderName,
      riderEmail: setupRequests.riderEmail,
      bikeLabel: setupRequests.bikeLabel,
      bikeYear: setupRequests.bikeYear,
      discipline: setupRequests.discipline,
      skill: setupRequests.skill,
      answers: setupRequests.answers,
      forkOilType: bikeModels.forkOilType,
      forkOilVolumeMl: bikeModels.forkOilVolumeMl,
    })
    .from(setupRequests)
    .leftJoin(bikeModels, eq(bikeModels.id, setupRequests.bikeModelId))
    .where(eq(setupRequests.id, requestId))
    .limit(1);
  return row ?? null;
}

const approver = alias(user, "approver");

export async function findSheetVersion(requestId: string, version: number) {
  const db = await getDb();
  const [row] = await db
    .select({
      version: recommendationVersions.version,
      state: recommendationVersions.state,
      output: recommendationVersions.output,
      notesForRider: recommendationVersions.notesForRider,
      approvedAt: recommendationVersions.approvedAt,
      updatedAt: recommendationVersions.updatedAt,
      approverName: approver.name,
    })
    .from(recommendationVersions)
    .leftJoin(approver, eq(approver.id, recommendationVersions.approvedById))
    .where(and(eq(recommendationVersions.requestId, requestId), eq(recommendationVersions.version, version)))
    .limit(1);
  return row ?? null;
}
