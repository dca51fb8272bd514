// Race sag against rider mass, per end: the riders' readings as dots, the engine's predictions for
// each report (its own spring and preload) with the fitted and with the catalog's loads as lines.
import { ForceChart } from "@/components/charts/force-chart";
import type { ReportComparison } from "@/lib/calibration/service";
import type { ChartSpec } from "@/lib/charts/force-curve";

type End = "rear" | "front";

function chartFor(rows: ReportComparison[], end: End): ChartSpec | null {
  const measured = rows.filter((r) => r[end]).sort((a, b) => a.riderMassKg - b.riderMassKg);
  if (measured.length === 0) return null;
  const line = (which: "fitted" | "catalog") =>
    measured.flatMap((r) => {
      const p = r[which]?.[end];
      return p ? [{ x: r.riderMassKg, y: p.raceMm }] : [];
    });
  const fitted = line("fitted");
  return {
    series: [
      ...(fitted.length
        ? [{ id: "fitted", label: "predicted with the fitted loads", emphasis: "main" as const, points: fitted }]
        : []),
      { id: "catalog", label: "predicted with the catalog's loads", emphasis: "secondary", points: line("catalog") },
      {
        id: "measured",
        label: "measured by the riders",
        emphasis: "main",
        dots: true,
        points: measured.map((r) => ({ x: r.riderMassKg, y: r[end]!.raceMm })),
      },
    ],
    xLabel: "Rider with gear (kg)",
    yLabel: "Race sag (mm)",
    width: 420,
    height: 240,
  };
}

export function SagCharts({ rows }: { rows: ReportComparison[] }) {
  const rear = chartFor(rows, "rear");
  const front = chartFor(rows, "front");
  if (!rear && !front) return null;
  return (
    <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
      {rear ? <ForceChart title="Rear race sag against rider mass" spec={rear} /> : null}
      {front ? <ForceChart title="Front race sag against rider mass" spec={front} /> : null}
    </div>
  );
}
