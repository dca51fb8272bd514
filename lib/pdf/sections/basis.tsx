// Which sizing basis the figures come from: the rate basis of each end (lib/sizing/README.md,
// "Model 2"), where the bike's loads came from (the catalog's values, a calibration fitted to the
// shop's sag reports, or the nearest generic class for a bike not listed) and the engine version.
import { Text, View } from "@react-pdf/renderer";
import type { Recommendation } from "@/lib/sizing";
import { s } from "../styles";

const BASIS = {
  "ride-frequency": "ride frequency (the stock spring's feel for the rider it was made for, scaled to this rider)",
  "sag-window": "sag window (the rate that meets both the race sag and the static sag targets)",
} as const;

export function sizingBasisLines(rec: Recommendation): string[] {
  const rear = rec.rear.rateBasis?.used ?? rec.resolved.rateBasis;
  const front = rec.front.kind === "air" ? null : (rec.front.rateBasis?.used ?? rec.resolved.rateBasis);
  const lines: string[] = [];
  if (rear && front && rear === front) lines.push(`Spring rates sized on ${BASIS[rear]}.`);
  else {
    if (rear) lines.push(`Shock spring sized on ${BASIS[rear]}.`);
    if (front) lines.push(`Fork spring sized on ${BASIS[front]}.`);
  }
  if (rec.front.kind === "air") lines.push("Fork air pressure sized on race sag.");
  const notListed = rec.warnings.some((w) => w.code === "BIKE_NOT_LISTED");
  const reports = rec.resolved.calibration?.reports;
  lines.push(
    reports
      ? `Bike loads fitted to ${reports} of the shop's sag reports on this model.`
      : notListed
        ? "Bike not in the catalog: loads of the nearest generic class (typical values), checked by the tuner."
        : "Bike loads from the shop's catalog.",
  );
  lines.push(`Rider ${rec.resolved.riderMassWithGearKg.toFixed(1)} kg with gear. Sizing engine ${rec.engineVersion}.`);
  return lines;
}

export function SizingBasis({ rec }: { rec: Recommendation }) {
  return (
    <View style={{ marginTop: 4 }} wrap={false}>
      <Text style={s.small}>{`Where these figures come from: ${sizingBasisLines(rec).join(" ")}`}</Text>
    </View>
  );
}
