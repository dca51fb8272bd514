// The rider's measured sag after fitting the springs, judged by the engine against the approved
// version: per end, spring right / too soft / too stiff and the preload change that puts race sag
// on target. Values are kept as given and in mm.
import { findApprovedVersion, insertSagReport } from "@/db/queries/status";
import { ConflictError, ValidationError } from "@/lib/errors";
import { kickOutbox } from "@/lib/mail";
import { notifyStaff } from "@/lib/notify-staff";
import { toMm } from "@/lib/requests/sizing-input";
import { SizingInputError, sagVerdict, type SagVerdict } from "@/lib/sizing";
import type { SagReport } from "@/lib/validations/status";

type End = "front" | "rear";
export interface EndMm {
  freeMm: number | null;
  staticMm: number;
  raceMm: number;
}

const round = (v: number) => Math.round(v * 100) / 100;

export async function reportSag(requestId: string, report: SagReport) {
  const approved = await findApprovedVersion(requestId);
  if (!approved) throw new ConflictError("Sag can be reported once the shop has approved your setup.");
  const { input, output: recommendation } = approved;
  const mm: Partial<Record<End, EndMm>> = {};
  const verdict: Partial<Record<End, SagVerdict>> = {};
  for (const end of ["front", "rear"] as const) {
    const given = report[end];
    if (given.static === undefined || given.race === undefined) continue;
    const reading = {
      freeMm: given.free === undefined ? null : round(toMm(given.free, report.unit)),
      staticMm: round(toMm(given.static, report.unit)),
      raceMm: round(toMm(given.race, report.unit)),
    };
    mm[end] = reading;
    try {
      verdict[end] = sagVerdict({
        input,
        recommendation,
        end,
        measured: { staticSagMm: reading.staticMm, raceSagMm: reading.raceMm },
      });
    } catch (error) {
      if (!(error instanceof SizingInputError)) throw error;
      const issue = error.issues[0];
      const field = issue?.path.endsWith("staticSagMm") ? "static" : "race";
      throw new ValidationError("Some measurements need attention.", {
        [`${end}.${field}`]: issue?.message ?? "Check this value",
      });
    }
  }
  const { token: _token, ...asGiven } = report;
  void _token;
  const measured = { asGiven, mm };
  const row = await insertSagReport(
    { requestId, versionId: approved.id, version: approved.version, measured, verdict },
    (tx) => notifyStaff(tx, { kind: "sag-reported", requestId, verdict }),
  );
  kickOutbox();
  return { id: row.id, createdAt: row.createdAt, version: approved.version, measured, verdict };
}
