// A chart geometry (lib/charts/force-curve.ts) as a captioned figure, drawn by the shared ChartSvg.
import { ChartSvg } from "@/components/charts/chart-svg";
import type { ChartGeometry } from "@/lib/charts/force-curve";

export function LineChart({
  geometry,
  title,
  description,
}: {
  geometry: ChartGeometry;
  title: string;
  description: string;
}) {
  return (
    <figure className="min-w-0 rounded-xl border border-stone-200 bg-white p-3">
      <figcaption className="mb-1 text-sm font-semibold text-stone-800">{title}</figcaption>
      <ChartSvg geometry={geometry} label={`${title}. ${description}`} />
      <p className="text-xs text-stone-600">{description}</p>
    </figure>
  );
}
