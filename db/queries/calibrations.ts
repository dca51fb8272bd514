// Calibrations of a catalog model from the shop's sag reports: the reports measured on the model
// (with the approved version they were measured on), the applied calibrations, apply and undo.
// The fit itself and what counts as applicable live in lib/calibration.
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { bikeCalibrations, recommendationVersions, sagReports, setupRequests } from "@/db/schema";
import { recordAudit, type AuditInsert } from "./audit";

export type CalibrationRow = typeof bikeCalibrations.$inferSelect;
export type NewCalibration = Omit<
  typeof bikeCalibrations.$inferInsert,
  "id" | "appliedAt" | "undoneAt" | "undoneById" | "undoneByLabel"
>;

/** Every sag report on requests for this model, oldest first, with the version it was measured on. */
export async function listModelSagReports(bikeModelId: string) {
  const db = await getDb();
  return db
    .select({
      id: sagReports.id,
      createdAt: sagReports.createdAt,
      measured: sagReports.measured,
      requestId: setupRequests.id,
      requestNumber: setupRequests.number,
      riderName: setupRequests.riderName,
      versionId: recommendationVersions.id,
      version: recommendationVersions.version,
      input: recommendationVersions.input,
      output: recommendationVersions.output,
    })
    .from(sagReports)
    .innerJoin(setupRequests, eq(setupRequests.id, sagReports.requestId))
    .innerJoin(recommendationVersions, eq(recommendationVersions.id, sagReports.versionId))
    .where(eq(setupRequests.bikeModelId, bikeModelId))
    .orderBy(asc(sagReports.createdAt), asc(sagReports.id));
}

export type ModelSagReportRow = Awaited<ReturnType<typeof listModelSagReports>>[number];

/** The calibration that feeds new recommendations for this model, if any. */
export async function getActiveCalibration(bikeModelId: string): Promise<CalibrationRow | null> {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(bikeCalibrations)
    .where(and(eq(bikeCalibrations.bikeModelId, bikeModelId), isNull(bikeCalibrations.undoneAt)));
  return row ?? null;
}

/**
 * The active calibration in the shape the engine's bike spec takes (`spec.calibration`), or
 * undefined: merged into the spec wherever a new recommendation is made for the model.
 */
export async function specCalibrationFor(bikeModelId: string) {
  const row = await getActiveCalibration(bikeModelId);
  return row
    ? {
        rearSprungKg: row.rearSprungKg,
        frontSprungKg: row.frontSprungKg,
        riderRearShare: row.riderRearShare,
        reports: row.reports,
      }
    : undefined;
}

/** Every calibration ever applied to the model, newest first. */
export async function listCalibrations(bikeModelId: string): Promise<CalibrationRow[]> {
  const db = await getDb();
  return db
    .select()
    .from(bikeCalibrations)
    .where(eq(bikeCalibrations.bikeModelId, bikeModelId))
    .orderBy(desc(bikeCalibrations.appliedAt), desc(bikeCalibrations.id));
}

interface Actor {
  id: string;
  label: string;
}

/** Applies a calibration, closing the active one (kept in the history), and audits, in one transaction. */
export async function insertCalibration(
  values: NewCalibration,
  actor: Actor,
  audit: Omit<AuditInsert, "actorUserId" | "actorLabel">,
) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const now = new Date();
    const replaced = await tx
      .update(bikeCalibrations)
      .set({ undoneAt: now, undoneById: actor.id, undoneByLabel: actor.label })
      .where(and(eq(bikeCalibrations.bikeModelId, values.bikeModelId), isNull(bikeCalibrations.undoneAt)))
      .returning({ id: bikeCalibrations.id });
    const [row] = await tx
      .insert(bikeCalibrations)
      .values({ ...values, appliedAt: now })
      .returning();
    await recordAudit(
      {
        ...audit,
        actorUserId: actor.id,
        actorLabel: actor.label,
        detail: { ...(audit.detail as object), calibrationId: row!.id, replacedId: replaced[0]?.id ?? null },
      },
      tx,
    );
    return row!;
  });
}

/** Closes the model's active calibration and audits; null when none was active. */
export async function closeActiveCalibration(
  bikeModelId: string,
  actor: Actor,
  audit: Omit<AuditInsert, "actorUserId" | "actorLabel">,
) {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(bikeCalibrations)
      .set({ undoneAt: new Date(), undoneById: actor.id, undoneByLabel: actor.label })
      .where(and(eq(bikeCalibrations.bikeModelId, bikeModelId), isNull(bikeCalibrations.undoneAt)))
      .returning();
    if (!row) return null;
    await recordAudit(
      {
        ...audit,
        actorUserId: actor.id,
        actorLabel: actor.label,
        detail: { ...(audit.detail as object), calibrationId: row.id },
      },
      tx,
    );
    return row;
  });
}
