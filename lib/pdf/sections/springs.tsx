// Fork and shock side by side: spring rate in three units next to the stock rate, preload (collar
// turns at the rear), sag targets, and oil level or air pressure.
import { Text, View } from "@react-pdf/renderer";
import type { FrontResult, RearResult } from "@/lib/sizing";
import { fixed, length, rateParts, turns } from "../format";
import { s } from "../styles";
import { KeyValue } from "./parts";

function RateTable({
  rateNmm,
  stockNmm,
  currentNmm,
  end,
}: {
  rateNmm: number;
  stockNmm: number | null;
  currentNmm?: number;
  end: "fork" | "shock";
}) {
  const rec = rateParts(rateNmm, end);
  const stock = stockNmm === null ? null : rateParts(stockNmm, end);
  // The springs the rider told us are fitted now get their own column only where they differ from
  // the catalog's stock rate (by more than rounding: 0.5 %); otherwise the stock column says so.
  const same = currentNmm !== undefined && stockNmm !== null && Math.abs(currentNmm - stockNmm) <= 0.005 * stockNmm;
  const now = currentNmm === undefined || same ? null : rateParts(currentNmm, end);
  const rows: [keyof typeof rec, string][] = [
    ["nMm", "N/mm"],
    ["kgfMm", "kgf/mm"],
    ["lbfIn", "lbf/in"],
  ];
  const w = now ? "33%" : "50%";
  return (
    <View style={{ marginBottom: 4 }}>
      <View style={s.tableHead}>
        <Text style={{ width: w }}>Recommended</Text>
        <Text style={{ width: w }}>{same ? "Stock, fitted now (as you told us)" : "Stock (the catalog's)"}</Text>
        {now ? <Text style={{ width: w }}>Fitted now (as you told us)</Text> : null}
      </View>
      {rows.map(([key]) => (
        <View key={key} style={s.tableRow}>
          <Text style={{ width: w, fontWeight: 700 }}>{rec[key]}</Text>
          <Text style={{ width: w }}>{stock ? stock[key] : "–"}</Text>
          {now ? <Text style={{ width: w }}>{now[key]}</Text> : null}
        </View>
      ))}
    </View>
  );
}

type SagState = RearResult["predicted"]["raceState"];

function expected(mm: number, state: SagState, imperial: boolean): string {
  if (state === "topped-out") return "0 mm (preload alone holds it topped out)";
  if (state === "bottomed") return "bottomed out";
  return length(mm, 0, imperial);
}

function SagLines({ result, imperial }: { result: FrontResult | RearResult; imperial: boolean }) {
  const t = result.sagTargets;
  return (
    <>
      <KeyValue label="Race sag target">{length(t.raceSagMm, 0, imperial)}</KeyValue>
      <KeyValue label="Static sag window">{`${fixed(t.staticSagMinMm, 0)}–${length(t.staticSagMaxMm, 0, imperial)}`}</KeyValue>
      <KeyValue label="Expected sag">
        {`race ${expected(result.predicted.raceSagMm, result.predicted.raceState, imperial)}, static ${expected(result.predicted.staticSagMm, result.predicted.staticState, imperial)}`}
      </KeyValue>
    </>
  );
}

/** "5W fork oil, 380 ml in each leg": what the catalog has of the two, or nothing. */
export function forkOilText(oil: { type: string | null; volumeMlPerLeg: number | null } | undefined, legs: number) {
  if (!oil || (!oil.type && oil.volumeMlPerLeg === null)) return null;
  const volume =
    oil.volumeMlPerLeg === null
      ? null
      : `${fixed(oil.volumeMlPerLeg, oil.volumeMlPerLeg % 1 ? 1 : 0)} ml ${legs === 1 ? "in the oil leg" : "in each leg"}`;
  return [oil.type, volume].filter(Boolean).join(", ");
}

export function ForkCard({
  front,
  imperial,
  currentNmm,
  forkOil,
}: {
  front: FrontResult;
  imperial: boolean;
  currentNmm?: number;
  forkOil?: { type: string | null; volumeMlPerLeg: number | null };
}) {
  const oil = forkOilText(forkOil, front.kind !== "air" && front.sprungLegs === 1 ? 1 : 2);
  const coil = front.kind !== "air" && front.chosenRate;
  return (
    <View style={[s.card, s.col]} wrap={false}>
      <Text style={s.h3}>Fork (front)</Text>
      {coil ? (
        <>
          <Text style={s.muted}>
            Spring rate {front.sprungLegs === 1 ? "of the one spring" : "per leg, a spring in each leg"}
          </Text>
          <RateTable
            rateNmm={front.chosenRate!.nMm}
            stockNmm={front.stockRate?.nMm ?? null}
            currentNmm={currentNmm}
            end="fork"
          />
          <KeyValue label="Preload">{length(front.preloadMm ?? 0, 1, imperial)}</KeyValue>
          <KeyValue label="Oil level">{`${length(front.oilLevelMm ?? front.stockOilLevelMm, 0, imperial)} (stock ${fixed(front.stockOilLevelMm, 0)} mm)`}</KeyValue>
          <Text style={s.small}>
            Oil level: measured down from the top of the outer tube, fork fully compressed, spring out.
          </Text>
          {oil ? <KeyValue label="Fork oil">{oil}</KeyValue> : null}
        </>
      ) : (
        <>
          <Text style={s.muted}>Air pressure, gauge, at top-out with the fork cold</Text>
          {front.airPressure ? (
            <View style={s.tableRow}>
              <Text style={{ width: "34%", fontWeight: 700 }}>{fixed(front.airPressure.kpaGauge, 0)} kPa</Text>
              <Text style={{ width: "33%", fontWeight: 700 }}>{fixed(front.airPressure.barGauge, 2)} bar</Text>
              <Text style={{ width: "33%", fontWeight: 700 }}>{fixed(front.airPressure.psiGauge, 1)} psi</Text>
            </View>
          ) : null}
          <Text style={s.small}>
            Set the pressure, then fine-tune it by measuring sag: air forks vary from one to the next.
          </Text>
          <KeyValue label="Oil level">{`as stock, ${length(front.stockOilLevelMm, 0, imperial)}`}</KeyValue>
          {oil ? <KeyValue label="Fork oil">{oil}</KeyValue> : null}
        </>
      )}
      <SagLines result={front} imperial={imperial} />
    </View>
  );
}

export function ShockCard({
  rear,
  collarPitchMm,
  imperial,
  currentNmm,
}: {
  rear: RearResult;
  collarPitchMm: number;
  imperial: boolean;
  currentNmm?: number;
}) {
  return (
    <View style={[s.card, s.col]} wrap={false}>
      <Text style={s.h3}>Shock (rear)</Text>
      <Text style={s.muted}>Spring rate</Text>
      <RateTable rateNmm={rear.chosenRate.nMm} stockNmm={rear.stockRate.nMm} currentNmm={currentNmm} end="shock" />
      <KeyValue label="Preload">{length(rear.preloadMm, 1, imperial)}</KeyValue>
      <KeyValue label="Collar">{`${turns(rear.preloadCollarTurns)} from where the collar just touches the spring (${fixed(collarPitchMm, 1)} mm per turn)`}</KeyValue>
      <SagLines result={rear} imperial={imperial} />
    </View>
  );
}
