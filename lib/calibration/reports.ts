// From stored sag reports to the engine's calibration reports, and the sag the engine predicts for
// each one. Pure: the caller loads the rows.
import {
  calibrationReportSchema,
  evaluateSetup,
  type BikeSpecInput,
  type CalibrationParameters,
  type CalibrationReport,
  type Recommendation,
  type SetupOverridesInput,
  type SizingInput,
} from "@/lib/sizing";

type End = "front" | "rear";
interface EndMm {
  staticMm: number;
  raceMm: number;
}

/** One stored report as lib/requests/sag-follow-up.ts writes it, with its version's input and output. */
export interface StoredSagReport {
  id: string;
  createdAt: Date;
  measured: unknown;
  requestId: string;
  requestNumber: number;
  versionId: string;
  version: number;
  input: unknown;
  output: unknown;
}

export interface UsableReport {
  id: string;
  createdAt: Date;
  requestId: string;
  requestNumber: number;
  version: number;
  input: SizingInput;
  report: CalibrationReport;
}

function endMm(measured: unknown, end: End): EndMm | null {
  const mm = (measured as { mm?: Partial<Record<End, EndMm>> } | null)?.mm?.[end];
  return mm && Number.isFinite(mm.staticMm) && Number.isFinite(mm.raceMm) ? mm : null;
}

/**
 * The fitted spring, preload, oil level or pressure come from the approved version the rider measured
 * on (its output, the tuner's changes included); the rider's mass with gear from the same output.
 * Only the first report on each version counts: a later one is usually taken after following the
 * verdict's preload advice, so the stored preload no longer describes the bike it was measured on.
 */
export function usableReports(rows: readonly StoredSagReport[]): { usable: UsableReport[]; skipped: number } {
  const seen = new Set<string>();
  const usable: UsableReport[] = [];
  let skipped = 0;
  for (const row of rows) {
    if (seen.has(row.versionId)) {
      skipped++;
      continue;
    }
    seen.add(row.versionId);
    const out = row.output as Partial<Recommendation> | null;
    const rear = endMm(row.measured, "rear");
    const front = endMm(row.measured, "front");
    const candidate: CalibrationReport = {
      riderMassKg: out?.resolved?.riderMassWithGearKg ?? NaN,
      rear:
        rear && out?.rear
          ? {
              rateNmm: out.rear.chosenRate.nMm,
              preloadMm: out.rear.preloadMm,
              staticSagMm: rear.staticMm,
              raceSagMm: rear.raceMm,
            }
          : undefined,
      front:
        front && out?.front
          ? {
              rateNmm: out.front.chosenRate?.nMm,
              preloadMm: out.front.preloadMm ?? undefined,
              oilLevelMm: out.front.oilLevelMm ?? undefined,
              airPressureKpaGauge: out.front.airPressure?.kpaGauge,
              staticSagMm: front.staticMm,
              raceSagMm: front.raceMm,
            }
          : undefined,
    };
    const parsed = calibrationReportSchema.safeParse(candidate);
    if (!parsed.success || (!candidate.rear && !candidate.front)) {
      skipped++;
      continue;
    }
    usable.push({
      id: row.id,
      createdAt: row.createdAt,
      requestId: row.requestId,
      requestNumber: row.requestNumber,
      version: row.version,
      input: row.input as SizingInput,
      report: candidate,
    });
  }
  return { usable, skipped };
}

export interface PredictedSag {
  rear: EndMm | null;
  front: EndMm | null;
}

/**
 * The sag the engine predicts for this report's rider on the springs and settings they fitted, with
 * the model's loads set to `parameters`: the recommendation's own force law, evaluated with the
 * report's figures as a tuner's overrides. Null when the engine refuses the combination.
 */
export function predictSag(
  spec: BikeSpecInput,
  r: UsableReport,
  parameters: CalibrationParameters,
): PredictedSag | null {
  const { rear, front } = r.report;
  const overrides: SetupOverridesInput = {
    rear: rear ? { rateNmm: rear.rateNmm, preloadMm: rear.preloadMm } : undefined,
    front: front
      ? spec.fork.kind === "air"
        ? { airPressureKpaGauge: front.airPressureKpaGauge }
        : { rateNmm: front.rateNmm, preloadMm: front.preloadMm, oilLevelMm: front.oilLevelMm }
      : undefined,
  };
  try {
    const rec = evaluateSetup({ ...r.input, bike: { ...spec, calibration: { ...parameters, reports: 1 } } }, overrides);
    const sag = (p: { staticSagMm: number; raceSagMm: number }) => ({ staticMm: p.staticSagMm, raceMm: p.raceSagMm });
    return { rear: rear ? sag(rec.rear.predicted) : null, front: front ? sag(rec.front.predicted) : null };
  } catch {
    return null;
  }
}
