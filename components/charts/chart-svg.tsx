// The one SVG renderer of a chart geometry from lib/charts/force-curve.ts (gridlines, ticks, axes,
// series, markers). The force charts of the review and the catalog's leverage preview both draw
// through it; the setup sheet draws the same geometry with react-pdf (lib/pdf/sections/chart.tsx).
import type { ChartGeometry } from "@/lib/charts/force-curve";
import { ScrollBox } from "@/components/ui/scroll-box";

export function ChartSvg({
  geometry: g,
  label,
  className = "h-auto w-full",
}: {
  geometry: ChartGeometry;
  label: string;
  className?: string;
}) {
  const midY = (g.plot.top + g.plot.bottom) / 2;
  // Never drawn narrower than its own width, so the axis text stays at its size on a phone: a narrow
  // screen scrolls the chart inside its own box instead of shrinking the text.
  return (
    <ScrollBox label={label}>
      <svg
        viewBox={`0 0 ${g.width} ${g.height}`}
        role="img"
        aria-label={label}
        className={className}
        style={{ minWidth: g.width }}
      >
        <g className="text-stone-300" stroke="currentColor" strokeWidth={1}>
          {g.yTicks.map((t) => (
            <line key={`y${t.value}`} x1={g.plot.left} x2={g.plot.right} y1={t.position} y2={t.position} />
          ))}
        </g>
        <g fontSize={11} fill="#44403c">
          {g.xTicks.map((t) => (
            <text key={`x${t.value}`} x={t.position} y={g.plot.bottom + 16} textAnchor="middle">
              {t.value}
            </text>
          ))}
          {g.yTicks.map((t) => (
            <text key={`yl${t.value}`} x={g.plot.left - 6} y={t.position + 4} textAnchor="end">
              {t.value}
            </text>
          ))}
          <text x={(g.plot.left + g.plot.right) / 2} y={g.height - 4} textAnchor="middle">
            {g.xLabel}
          </text>
          <text transform={`translate(12 ${midY}) rotate(-90)`} textAnchor="middle">
            {g.yLabel}
          </text>
        </g>
        <line x1={g.plot.left} x2={g.plot.left} y1={g.plot.top} y2={g.plot.bottom} stroke="#78716c" />
        <line x1={g.plot.left} x2={g.plot.right} y1={g.plot.bottom} y2={g.plot.bottom} stroke="#78716c" />
        {g.series.flatMap((s) =>
          (s.dots ?? []).map((p, i) => (
            <circle key={`${s.id}${i}`} cx={p.x} cy={p.y} r={4} fill={s.emphasis === "main" ? "#b45309" : "#a8a29e"} />
          )),
        )}
        {g.series
          .filter((s) => !s.dots)
          .map((s) => (
            <path
              key={s.id}
              d={s.d}
              fill="none"
              stroke={s.emphasis === "main" ? "#1d5f50" : "#a8a29e"}
              strokeWidth={s.emphasis === "main" ? 2.5 : 1.5}
              strokeDasharray={s.emphasis === "main" ? undefined : "5 4"}
            />
          ))}
        {g.markers.map((m, i) => (
          <g key={m.label}>
            <line
              x1={m.position}
              x2={m.position}
              y1={g.plot.top}
              y2={g.plot.bottom}
              stroke="#b45309"
              strokeDasharray="3 3"
            />
            <text x={m.position + 3} y={g.plot.top + 12 + i * 13} fontSize={11} fill="#92400e">
              {m.label}
            </text>
          </g>
        ))}
      </svg>
    </ScrollBox>
  );
}
