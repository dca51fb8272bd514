// Geometry of a force-versus-travel chart, computed once with d3-scale/d3-shape so the screen
// (React SVG) and the setup sheet (react-pdf Svg) draw exactly the same paths from the engine's curves.
import { scaleLinear } from "d3-scale";
import { line } from "d3-shape";

export interface ChartPoint {
  x: number;
  y: number;
}

export interface ChartSeries {
  id: string;
  label: string;
  points: ChartPoint[];
  /** The main series is drawn solid; others (e.g. neighbouring oil levels) dashed. */
  emphasis: "main" | "secondary";
  /** Separate readings (e.g. measured sag) are drawn as dots, not joined by a line. */
  dots?: boolean;
}

export interface ChartMarker {
  label: string;
  x: number;
}

export interface ChartGeometry {
  width: number;
  height: number;
  plot: { left: number; top: number; right: number; bottom: number };
  series: { id: string; label: string; emphasis: "main" | "secondary"; d: string; dots?: { x: number; y: number }[] }[];
  xTicks: { value: number; position: number }[];
  yTicks: { value: number; position: number }[];
  markers: { label: string; position: number }[];
  xLabel: string;
  yLabel: string;
}

export interface ChartSpec {
  series: ChartSeries[];
  markers?: ChartMarker[];
  xLabel: string;
  yLabel: string;
  width?: number;
  height?: number;
}

const MARGIN = { left: 52, right: 12, top: 12, bottom: 40 };

export function forceChartGeometry(spec: ChartSpec): ChartGeometry {
  const width = spec.width ?? 480;
  const height = spec.height ?? 280;
  const all = spec.series.flatMap((s) => s.points);
  const maxX = Math.max(1, ...all.map((p) => p.x));
  const maxY = Math.max(1, ...all.map((p) => p.y));
  const x = scaleLinear()
    .domain([0, maxX])
    .range([MARGIN.left, width - MARGIN.right]);
  const y = scaleLinear()
    .domain([0, maxY])
    .nice()
    .range([height - MARGIN.bottom, MARGIN.top]);
  const path = line<ChartPoint>()
    .x((p) => x(p.x))
    .y((p) => y(p.y));
  const round = (v: number) => Math.round(v * 100) / 100;
  return {
    width,
    height,
    plot: { left: MARGIN.left, top: MARGIN.top, right: width - MARGIN.right, bottom: height - MARGIN.bottom },
    series: spec.series.map((s) =>
      s.dots
        ? {
            id: s.id,
            label: s.label,
            emphasis: s.emphasis,
            d: "",
            dots: s.points.map((p) => ({ x: round(x(p.x)), y: round(y(p.y)) })),
          }
        : { id: s.id, label: s.label, emphasis: s.emphasis, d: path.digits(2)(s.points) ?? "" },
    ),
    xTicks: x.ticks(6).map((value) => ({ value, position: round(x(value)) })),
    yTicks: y.ticks(5).map((value) => ({ value, position: round(y(value)) })),
    markers: (spec.markers ?? [])
      .filter((m) => Number.isFinite(m.x) && m.x >= 0 && m.x <= maxX)
      .map((m) => ({ label: m.label, position: round(x(m.x)) })),
    xLabel: spec.xLabel,
    yLabel: spec.yLabel,
  };
}
