"use client";

// The sag report form and the rider's reports, newest first. A report just sent joins the list at
// once from the API's answer, without waiting for the page to reload.
import { useState } from "react";
import type { RiderStatus } from "@/db/queries/status";
import { formatDay } from "@/lib/format";
import { SAG_TERMS } from "@/lib/validations/sag-terms";
import { SagForm } from "./sag-form";
import { VerdictCard } from "./verdict-card";

export type SagReportRow = RiderStatus["reports"][number];

function Readings({ report }: { report: SagReportRow }) {
  const given = report.measured.asGiven;
  const parts = (["rear", "front"] as const).flatMap((end) => {
    const e = given[end];
    if (e?.static === undefined || e.race === undefined) return [];
    const name = end === "rear" ? "Rear" : "Front";
    return [
      `${name}: ${SAG_TERMS.static.name.toLowerCase()} ${e.static} ${given.unit}, ${SAG_TERMS.race.name.toLowerCase()} ${e.race} ${given.unit}` +
        (e.free === undefined ? "" : `, ${SAG_TERMS.free.name.toLowerCase()} ${e.free} ${given.unit}`),
    ];
  });
  return <p className="text-sm text-stone-700">{parts.join(" · ")}</p>;
}

export function SagFollowUp({
  requestId,
  token,
  metric,
  reports: initial,
}: {
  requestId: string;
  token?: string;
  metric: boolean;
  reports: SagReportRow[];
}) {
  const [reports, setReports] = useState(initial);
  return (
    <>
      <SagForm
        requestId={requestId}
        token={token}
        metric={metric}
        onReported={(report) => setReports((list) => [report, ...list.filter((r) => r.id !== report.id)])}
      />
      {reports.length ? (
        <section aria-labelledby="earlier-reports-heading" className="flex flex-col gap-2">
          <h3 id="earlier-reports-heading" className="font-semibold">
            Your earlier reports
          </h3>
          <ul className="flex flex-col gap-3">
            {reports.map((r) => (
              <li key={r.id} className="flex flex-col gap-2">
                <p className="text-sm text-stone-600">Reported {formatDay(r.createdAt)}</p>
                <Readings report={r} />
                {(["rear", "front"] as const).map((end) =>
                  r.verdict[end] ? <VerdictCard key={end} verdict={r.verdict[end]} /> : null,
                )}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </>
  );
}
