// A force-versus-travel chart drawn as vector paths. The geometry comes from lib/charts, the same
// d3 paths the request page draws on screen; here the viewBox scales it to the column.
import { G, Line, Path, Svg, Text as SvgText, Text, View } from "@react-pdf/renderer";
import type { ChartGeometry } from "@/lib/charts/force-curve";
import { SHEET_FONT } from "../fonts";
import { COLORS, s } from "../styles";

const TICK_FONT = 13;
// Svg text does not inherit the page font: name it, or the viewer falls back to its own Helvetica.
const tick = { fontSize: TICK_FONT, fontFamily: SHEET_FONT };

/** One legend line for the solid series, one for all dashed ones together, each label once. */
export function legendLines(series: ChartGeometry["series"]): string[] {
  const unique = (labels: string[]) => [...new Set(labels)];
  const main = unique(series.filter((l) => l.emphasis === "main").map((l) => l.label));
  const other = unique(series.filter((l) => l.emphasis !== "main").map((l) => l.label));
  const lines: string[] = [];
  if (main.length) lines.push(`Solid line: ${main.join("; ")}`);
  if (other.length) lines.push(`${other.length === 1 ? "Dashed line" : "Dashed lines"}: ${other.join("; ")}`);
  return lines;
}

export function ForceChart({ title, geometry, width }: { title: string; geometry: ChartGeometry; width: number }) {
  const g = geometry;
  const height = (width * g.height) / g.width;
  const { left, right, top, bottom } = g.plot;
  return (
    <View style={{ width }} wrap={false}>
      <Text style={s.h3}>{title}</Text>
      <Text style={s.small}>{`${g.yLabel} against ${g.xLabel.toLowerCase()}`}</Text>
      <Svg width={width} height={height} viewBox={`0 0 ${g.width} ${g.height}`}>
        {g.yTicks.map((t) => (
          <G key={`y${t.value}`}>
            <Line x1={left} x2={right} y1={t.position} y2={t.position} stroke={COLORS.rule} strokeWidth={1} />
            <SvgText x={left - 6} y={t.position + 4} style={tick} fill={COLORS.muted} textAnchor="end">
              {String(t.value)}
            </SvgText>
          </G>
        ))}
        {g.xTicks.map((t) => (
          <SvgText
            key={`x${t.value}`}
            x={t.position}
            y={bottom + 18}
            style={tick}
            fill={COLORS.muted}
            textAnchor="middle"
          >
            {String(t.value)}
          </SvgText>
        ))}
        <Line x1={left} x2={left} y1={top} y2={bottom} stroke={COLORS.ink} strokeWidth={1.2} />
        <Line x1={left} x2={right} y1={bottom} y2={bottom} stroke={COLORS.ink} strokeWidth={1.2} />
        {g.markers.map((m) => (
          <G key={m.label}>
            <Line
              x1={m.position}
              x2={m.position}
              y1={top}
              y2={bottom}
              stroke={COLORS.amber}
              strokeWidth={1.2}
              strokeDasharray="4 3"
            />
            <SvgText
              x={m.position + 3}
              y={m.label === "race sag" ? top + 14 : top + 30}
              style={tick}
              fill={COLORS.amber}
            >
              {m.label}
            </SvgText>
          </G>
        ))}
        {g.series.map((line) => (
          <Path
            key={line.id}
            d={line.d}
            fill="none"
            stroke={line.emphasis === "main" ? COLORS.pine : COLORS.muted}
            strokeWidth={line.emphasis === "main" ? 2.5 : 1.2}
            strokeDasharray={line.emphasis === "main" ? undefined : "6 4"}
          />
        ))}
      </Svg>
      {legendLines(g.series).map((line) => (
        <Text key={line} style={s.small}>
          {line}
        </Text>
      ))}
    </View>
  );
}
