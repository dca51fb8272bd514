// Who the setup is for and on what: the rider's answers as given, and the mass the sizing used.
import { Text, View } from "@react-pdf/renderer";
import { disciplineLabel, skillLabel } from "@/lib/labels";
import { fixed } from "../format";
import type { SheetData } from "../sheet-data";
import { s } from "../styles";
import { KeyValue } from "./parts";

export function RiderAndBike({ data }: { data: SheetData }) {
  const { request, recommendation: rec } = data;
  const given = request.riderWeight
    ? `${fixed(request.riderWeight.value, request.riderWeight.value % 1 ? 1 : 0)} ${request.riderWeight.unit}` +
      (request.gearIncluded === null ? "" : request.gearIncluded ? " with gear" : " without gear")
    : "–";
  return (
    <View style={s.row} wrap={false}>
      <View style={s.col}>
        <Text style={s.h2}>Rider</Text>
        <KeyValue label="Name">{request.riderName}</KeyValue>
        <KeyValue label="Weight given">{given}</KeyValue>
        <KeyValue label="Sized for (with gear)">{fixed(rec.resolved.riderMassWithGearKg, 1)} kg</KeyValue>
        <KeyValue label="Riding">{`${disciplineLabel(request.discipline)}, ${skillLabel(request.skill).toLowerCase()}`}</KeyValue>
      </View>
      <View style={s.col}>
        <Text style={s.h2}>Bike</Text>
        <KeyValue label="Model">{request.bikeLabel}</KeyValue>
        <KeyValue label="Year">{request.bikeYear ? String(request.bikeYear) : "–"}</KeyValue>
        <KeyValue label="Fork">
          {rec.front.kind === "air"
            ? "Air spring"
            : rec.front.sprungLegs === 1
              ? "Coil, one spring"
              : "Coil, a spring in each leg"}
        </KeyValue>
        <KeyValue label="Rear wheel travel">{fixed(rec.input.bike.rear.wheelTravelMm, 0)} mm</KeyValue>
      </View>
    </View>
  );
}
