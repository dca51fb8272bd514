// Force against travel as SVG, drawn from forceChartGeometry (lib/charts): the setup sheet draws the
// same geometry with react-pdf, so screen and paper show the same paths.
import { forceChartGeometry, type ChartSpec } from "@/lib/charts/force-curve";

export function ForceChart({ spec, title, id }: { spec: ChartSpec; title: string; id: string }) {
  const g = forceChartGeometry(spec);
  const main = g.series.find((s) => s.emphasis === "main");
  return (
    <figure className="flex flex-col gap-2">
      <svg
        viewBox={`0 0 ${g.width} ${g.height}`}
        className="h-auto w-full max-w-xl"
        role="img"
        aria-labelledby={`${id}-title`}
      >
        <title id={`${id}-title`}>{`${title}: ${main?.label ?? ""}`}</title>
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
          <text transform={`translate(12 ${(g.plot.top + g.plot.bottom) / 2}) rotate(-90)`} textAnchor="middle">
            {g.yLabel}
          </text>
        </g>
        <line x1={g.plot.left} x2={g.plot.left} y1={g.plot.top} y2={g.plot.bottom} stroke="#78716c" />
        <line x1={g.plot.left} x2={g.plot.right} y1={g.plot.bottom} y2={g.plot.bottom} stroke="#78716c" />
        {g.series.flatMap((s) =>
          (s.dots ?? []).map((p, i) => <circle key={`${s.id}${i}`} cx={p.x} cy={p.y} r={4} fill={s.emphasis === "main" ? "#b45309" : "#a8a29e"} />),
        )}
        {g.series.filter((s) => !s.dots).map((s) => (
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
            <line x1={m.position} x2={m.position} y1={g.plot.top} y2={g.plot.bottom} stroke="#b45309" strokeDasharray="3 3" />
            <text x={m.position + 3} y={g.plot.top + 12 + i * 13} fontSize={11} fill="#92400e">
              {m.label}
            </text>
          </g>
        ))}
      </svg>
      <figcaption className="text-sm text-stone-700">
        <span className="font-medium">{title}.</span>{" "}
        {g.series.map((s) => `${s.dots ? "dots" : s.emphasis === "main" ? "solid" : "dashed"}: ${s.label}`).join("; ")}.
      </figcaption>
    </figure>
  );
}
