import type { ChartGeometry } from "@/lib/charts/force-curve";

/** Draws a geometry from lib/charts/force-curve.ts as an accessible SVG figure. */
export function LineChart({ geometry, title, description }: { geometry: ChartGeometry; title: string; description: string }) {
  const g = geometry;
  return (
    <figure className="rounded-xl border border-stone-200 bg-white p-3">
      <figcaption className="mb-1 text-sm font-semibold text-stone-800">{title}</figcaption>
      <svg viewBox={`0 0 ${g.width} ${g.height}`} role="img" aria-label={`${title}. ${description}`} className="h-auto w-full">
        {g.yTicks.map((t) => (
          <g key={`y${t.value}`}>
            <line x1={g.plot.left} x2={g.plot.right} y1={t.position} y2={t.position} stroke="#e7e5e4" />
            <text x={g.plot.left - 6} y={t.position + 4} textAnchor="end" fontSize="11" fill="#57534e">{t.value}</text>
          </g>
        ))}
        {g.xTicks.map((t) => (
          <text key={`x${t.value}`} x={t.position} y={g.plot.bottom + 16} textAnchor="middle" fontSize="11" fill="#57534e">{t.value}</text>
        ))}
        <line x1={g.plot.left} x2={g.plot.right} y1={g.plot.bottom} y2={g.plot.bottom} stroke="#78716c" />
        <line x1={g.plot.left} x2={g.plot.left} y1={g.plot.top} y2={g.plot.bottom} stroke="#78716c" />
        {g.series.map((s) => (
          <path key={s.id} d={s.d} fill="none" stroke={s.emphasis === "main" ? "#185a4b" : "#b45309"} strokeWidth={2} strokeDasharray={s.emphasis === "main" ? undefined : "5 4"} />
        ))}
        {g.markers.map((m) => (
          <g key={m.label}>
            <line x1={m.position} x2={m.position} y1={g.plot.top} y2={g.plot.bottom} stroke="#a8a29e" strokeDasharray="2 3" />
            <text x={m.position + 3} y={g.plot.top + 10} fontSize="10" fill="#44403c">{m.label}</text>
          </g>
        ))}
        <text x={(g.plot.left + g.plot.right) / 2} y={g.height - 6} textAnchor="middle" fontSize="11" fill="#292524">{g.xLabel}</text>
        <text x={12} y={(g.plot.top + g.plot.bottom) / 2} textAnchor="middle" fontSize="11" fill="#292524" transform={`rotate(-90 12 ${(g.plot.top + g.plot.bottom) / 2})`}>{g.yLabel}</text>
      </svg>
      <p className="text-xs text-stone-600">{description}</p>
    </figure>
  );
}
