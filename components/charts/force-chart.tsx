// Force against travel, drawn from forceChartGeometry (lib/charts) by the shared ChartSvg: the setup
// sheet draws the same geometry with react-pdf, so screen and paper show the same paths.
import { forceChartGeometry, type ChartSpec } from "@/lib/charts/force-curve";
import { ChartSvg } from "./chart-svg";

export function ForceChart({ spec, title }: { spec: ChartSpec; title: string }) {
  const g = forceChartGeometry(spec);
  const main = g.series.find((s) => s.emphasis === "main");
  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <ChartSvg geometry={g} label={`${title}: ${main?.label ?? ""}`} className="h-auto w-full max-w-xl" />
      <figcaption className="text-sm text-stone-700">
        <span className="font-medium">{title}.</span>{" "}
        {g.series.map((s) => `${s.dots ? "dots" : s.emphasis === "main" ? "solid" : "dashed"}: ${s.label}`).join("; ")}.
      </figcaption>
    </figure>
  );
}
