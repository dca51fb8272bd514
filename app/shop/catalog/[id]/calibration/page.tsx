import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CalibrationActions } from "@/components/calibration/calibration-actions";
import { ParametersTable } from "@/components/calibration/parameters-table";
import { ReportsTable } from "@/components/calibration/reports-table";
import { SagCharts } from "@/components/calibration/sag-charts";
import { getBikeModel } from "@/db/queries/bikes";
import { requireRole } from "@/lib/auth/guard";
import { getCalibrationPage } from "@/lib/calibration/service";
import { isUuid } from "@/lib/validations/id";
import { MIN_CALIBRATION_REPORTS } from "@/lib/sizing";

export const metadata: Metadata = { title: "Calibration from sag reports" };
export const dynamic = "force-dynamic";

const day = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

export default async function CalibrationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requireRole(["admin"], { page: `/shop/catalog/${id}/calibration` });
  if (!isUuid(id)) notFound();
  const model = await getBikeModel(id);
  if (!model) notFound();
  const { summary, comparisons, history } = await getCalibrationPage(id);
  const { fit, active } = summary;

  return (
    <div className="flex flex-col gap-5">
      <Link
        href={`/shop/catalog/${id}`}
        className="inline-flex min-h-11 w-fit items-center text-sm text-pine-700 underline"
      >
        ← {model.name}
      </Link>
      <h1 className="text-2xl font-bold">Calibration from sag reports</h1>
      <p className="max-w-3xl text-stone-700">
        Every sag report on {model.name} was measured on a known spring and preload. From them the engine fits what the
        bike really puts on each end (bike alone) and the rider&apos;s share on the rear, by least squares, and compares
        the sag it would have predicted with the catalog&apos;s loads and with the fitted ones. It needs at least{" "}
        {MIN_CALIBRATION_REPORTS} reports that agree. Applied loads are used only for new recommendations; every apply
        and undo is logged.
      </p>

      <section
        aria-labelledby="calibration-state"
        className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
      >
        <h2 id="calibration-state" className="text-lg font-semibold">
          In use for new recommendations
        </h2>
        {active ? (
          <p>
            <span className="font-semibold">Calibrated loads</span> from {active.reports} reports, applied{" "}
            {day.format(new Date(active.appliedAt))} by {active.appliedBy}.
            {active.matchesFit ? "" : " The reports now give a different fit: apply it to use it."}
          </p>
        ) : (
          <p>
            <span className="font-semibold">The catalog&apos;s values</span> (weight split and default rider share).
          </p>
        )}
        {fit ? (
          <p>
            Fit from {summary.reports} reports: predicted sag misses the measured by {fit.rmsBeforeMm.toFixed(1)} mm RMS
            with the catalog&apos;s loads and by {fit.rmsAfterMm.toFixed(1)} mm with the fitted ones.
          </p>
        ) : (
          <p role="status" className="rounded-lg bg-stone-100 p-3">
            <span className="font-semibold">No fit:</span> {summary.reason}
          </p>
        )}
        {summary.skippedReports > 0 ? (
          <p className="text-sm text-stone-600">
            {summary.skippedReports} report{summary.skippedReports === 1 ? " was" : "s were"} left out: a second report
            on the same approved setup (usually after moving the preload), or one without the figures to fit.
          </p>
        ) : null}
        <CalibrationActions
          id={id}
          canApply={Boolean(fit) && !(active?.matchesFit ?? false)}
          canUndo={Boolean(active)}
        />
        <p className="text-sm text-stone-600">
          The fitted loads change the proposal, not the bike: riders still set sag by measuring, as the sheet says, and
          the manufacturer&apos;s manual has the last word on spring and preload limits.
        </p>
      </section>

      <section aria-labelledby="calibration-loads" className="flex flex-col gap-3">
        <h2 id="calibration-loads" className="text-lg font-semibold">
          Loads
        </h2>
        <ParametersTable
          catalog={summary.catalog}
          fitted={fit?.parameters ?? null}
          reports={summary.reports}
          active={active}
        />
      </section>

      <section aria-labelledby="calibration-reports" className="flex flex-col gap-3">
        <h2 id="calibration-reports" className="text-lg font-semibold">
          Sag reports ({comparisons.length})
        </h2>
        <SagCharts rows={comparisons} />
        <ReportsTable rows={comparisons} />
      </section>

      {history.length ? (
        <section aria-labelledby="calibration-history" className="flex flex-col gap-2">
          <h2 id="calibration-history" className="text-lg font-semibold">
            History
          </h2>
          <ul className="flex flex-col gap-1 text-sm">
            {history.map((h) => (
              <li key={h.id}>
                Applied {day.format(new Date(h.appliedAt))} by {h.appliedBy}: {h.parameters.rearSprungKg.toFixed(1)} kg
                rear, {h.parameters.frontSprungKg.toFixed(1)} kg front, {(h.parameters.riderRearShare * 100).toFixed(1)}{" "}
                % rider on the rear, from {h.reports} reports
                {h.undoneAt ? `; undone ${day.format(new Date(h.undoneAt))} by ${h.undoneBy ?? "someone"}` : "; in use"}
                .
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
