// The one SVG chart renderer draws exactly the geometry lib/charts computes (the geometry the setup
// sheet also draws): every series path, every tick label, and an accessible name for the figure
// (WAI-ARIA 1.2: role "img" needs a name).
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ForceChart } from "@/components/charts/force-chart";
import { forceChartGeometry } from "@/lib/charts/force-curve";
import { rearForceChart } from "@/lib/charts/recommendation-charts";
import { buildSizingInput } from "@/lib/requests/sizing-input";
import { referenceAnswers } from "@/lib/shop/target-preview";
import { recommend, sizingDefaults } from "@/lib/sizing";

const rec = recommend(
  buildSizingInput(
    referenceAnswers({
      riderMassKg: 80,
      discipline: "enduro",
      skill: "intermediate",
      bikeModelId: "6f1c2a4e-9b3d-4c5e-8f7a-1b2c3d4e5f60",
    }),
    {
      bike: sizingDefaults.GENERIC_BIKE_CLASSES[0]!.spec,
      targets: null,
      stock: {
        forkRatesNmm: sizingDefaults.TYPICAL_FORK_RATES_NMM,
        shockRatesNmm: sizingDefaults.TYPICAL_SHOCK_RATES_NMM,
      },
      clickerRules: undefined,
      gearMassKg: sizingDefaults.DEFAULT_GEAR_MASS_KG,
      frequencyRatioWindow: { ...sizingDefaults.FREQUENCY_RATIO_WINDOW },
    },
  ),
);

describe("ChartSvg through ForceChart", () => {
  const spec = rearForceChart(rec);
  const geometry = forceChartGeometry(spec);
  const html = renderToStaticMarkup(ForceChart({ spec, title: "Shock" }));

  it("draws every series path of the geometry", () => {
    expect(geometry.series.length).toBeGreaterThan(0);
    for (const s of geometry.series) expect(html).toContain(`d="${s.d}"`);
  });

  it("writes every tick label and names the figure", () => {
    for (const t of [...geometry.xTicks, ...geometry.yTicks]) expect(html).toContain(`>${t.value}</text>`);
    expect(html).toMatch(/role="img" aria-label="Shock: [^"]+"/);
  });
});
