// Calibration of a catalog model from the shop's own sag reports: fit (lib/sizing's
// fitCalibration), apply and undo. Applied values feed new recommendations only (the intake merges
// the active calibration into the bike spec); every apply and undo is audited.
import { getBikeModel } from "@/db/queries/bikes";
import {
  closeActiveCalibration,
  getActiveCalibration,
  insertCalibration,
  listCalibrations,
  listModelSagReports,
  type CalibrationRow,
} from "@/db/queries/calibrations";
import type { SessionUser } from "@/lib/auth/guard";
import { ConflictError, NotFoundError } from "@/lib/errors";
import {
  bikeSpecSchema,
  catalogParameters,
  fitCalibration,
  type BikeSpecInput,
  type CalibrationFit,
  type CalibrationParameters,
} from "@/lib/sizing";
import { predictSag, usableReports, type PredictedSag, type UsableReport } from "./reports";

/** Two fits this close (kg, share) are the same calibration: applying it again changes nothing. */
const SAME_KG = 0.05;
const SAME_SHARE = 0.0005;

interface ModelFit {
  spec: BikeSpecInput;
  usable: UsableReport[];
  skipped: number;
  fit: CalibrationFit;
  active: CalibrationRow | null;
}

async function fitModel(bikeModelId: string): Promise<ModelFit> {
  const model = await getBikeModel(bikeModelId);
  if (!model) throw new NotFoundError("No such bike model.");
  // The catalog's own figures, never a calibration someone stored in the spec.
  const spec: BikeSpecInput = { ...bikeSpecSchema.parse(model.spec), calibration: undefined };
  const [rows, active] = await Promise.all([listModelSagReports(bikeModelId), getActiveCalibration(bikeModelId)]);
  const { usable, skipped } = usableReports(rows);
  const fit = fitCalibration(
    spec,
    usable.map((u) => u.report),
  );
  return { spec, usable, skipped, fit, active };
}

const parametersOf = (row: CalibrationRow): CalibrationParameters => ({
  rearSprungKg: row.rearSprungKg,
  frontSprungKg: row.frontSprungKg,
  riderRearShare: row.riderRearShare,
});

function sameParameters(a: CalibrationParameters, b: CalibrationParameters) {
  return (
    Math.abs(a.rearSprungKg - b.rearSprungKg) < SAME_KG &&
    Math.abs(a.frontSprungKg - b.frontSprungKg) < SAME_KG &&
    Math.abs(a.riderRearShare - b.riderRearShare) < SAME_SHARE
  );
}

const activeView = (row: CalibrationRow) => ({
  id: row.id,
  parameters: parametersOf(row),
  reports: row.reports,
  rmsBeforeMm: row.rmsBeforeMm,
  rmsAfterMm: row.rmsAfterMm,
  appliedAt: row.appliedAt.toISOString(),
  appliedBy: row.appliedByLabel,
});

/** What GET /api/shop/catalog/[id]/calibration answers. */
export async function getCalibrationSummary(bikeModelId: string) {
  return summarize(await fitModel(bikeModelId));
}

function summarize({ spec, usable, skipped, fit, active }: ModelFit) {
  return {
    reports: usable.length,
    fit: fit.ok
      ? {
          parameters: fit.parameters,
          residualsMm: fit.residualsMm,
          rmsBeforeMm: fit.rmsBeforeMm,
          rmsAfterMm: fit.rmsAfterMm,
        }
      : null,
    applied: active !== null,
    ...(fit.ok ? {} : { reason: fit.reason }),
    /** Reports left out: a second report on the same version, or one without the figures to fit. */
    skippedReports: skipped,
    catalog: catalogParameters(spec),
    active: active
      ? { ...activeView(active), matchesFit: fit.ok && sameParameters(parametersOf(active), fit.parameters) }
      : null,
  };
}

export interface ReportComparison {
  id: string;
  createdAt: string;
  requestId: string;
  requestNumber: number;
  version: number;
  riderMassKg: number;
  rear: { rateNmm: number; preloadMm: number; staticMm: number; raceMm: number } | null;
  front: {
    rateNmm: number | null;
    preloadMm: number | null;
    airPressureKpaGauge: number | null;
    staticMm: number;
    raceMm: number;
  } | null;
  catalog: PredictedSag | null;
  fitted: PredictedSag | null;
}

/** Everything the admin page shows: the summary, each report beside its predictions, the history. */
export async function getCalibrationPage(bikeModelId: string) {
  const modelFit = await fitModel(bikeModelId);
  const { spec, usable } = modelFit;
  const summary = summarize(modelFit);
  const fitted = summary.fit?.parameters ?? null;
  const comparisons: ReportComparison[] = usable.map((u) => {
    const { rear, front } = u.report;
    return {
      id: u.id,
      createdAt: u.createdAt.toISOString(),
      requestId: u.requestId,
      requestNumber: u.requestNumber,
      version: u.version,
      riderMassKg: u.report.riderMassKg,
      rear: rear
        ? { rateNmm: rear.rateNmm, preloadMm: rear.preloadMm, staticMm: rear.staticSagMm, raceMm: rear.raceSagMm }
        : null,
      front: front
        ? {
            rateNmm: front.rateNmm ?? null,
            preloadMm: front.preloadMm ?? null,
            airPressureKpaGauge: front.airPressureKpaGauge ?? null,
            staticMm: front.staticSagMm,
            raceMm: front.raceSagMm,
          }
        : null,
      catalog: predictSag(spec, u, summary.catalog),
      fitted: fitted ? predictSag(spec, u, fitted) : null,
    };
  });
  const history = (await listCalibrations(bikeModelId)).map((row) => ({
    ...activeView(row),
    undoneAt: row.undoneAt?.toISOString() ?? null,
    undoneBy: row.undoneByLabel,
  }));
  return { summary, comparisons, history };
}

const actorOf = (user: SessionUser) => ({ id: user.id, label: user.name });

/** Applies the current fit; 409 when the fit refuses or is already the active calibration. */
export async function applyCalibration(bikeModelId: string, user: SessionUser) {
  const { usable, fit, active } = await fitModel(bikeModelId);
  if (!fit.ok) throw new ConflictError(`Nothing to apply: ${fit.reason}`);
  if (active && sameParameters(parametersOf(active), fit.parameters))
    throw new ConflictError("Nothing to apply: this fit is already the model's calibration.");
  const row = await insertCalibration(
    {
      bikeModelId,
      ...fit.parameters,
      reports: fit.reports,
      sagReportIds: usable.map((u) => u.id),
      rmsBeforeMm: fit.rmsBeforeMm,
      rmsAfterMm: fit.rmsAfterMm,
      appliedById: user.id,
      appliedByLabel: user.name,
    },
    actorOf(user),
    {
      action: "calibration.applied",
      detail: {
        bikeModelId,
        parameters: fit.parameters,
        reports: fit.reports,
        rmsBeforeMm: fit.rmsBeforeMm,
        rmsAfterMm: fit.rmsAfterMm,
      },
    },
  );
  return activeView(row);
}

/** Undoes the active calibration: new recommendations go back to the catalog's weight split. */
export async function undoCalibration(bikeModelId: string, user: SessionUser) {
  if (!(await getBikeModel(bikeModelId))) throw new NotFoundError("No such bike model.");
  const row = await closeActiveCalibration(bikeModelId, actorOf(user), {
    action: "calibration.undone",
    detail: { bikeModelId },
  });
  if (!row) throw new ConflictError("Nothing to undo: this model has no calibration applied.");
  return { ...activeView(row), undoneAt: row.undoneAt?.toISOString() ?? null, undoneBy: row.undoneByLabel };
}
