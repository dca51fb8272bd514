// How to measure sag, the rider's link to report it, and the safety cautions. Our own wording; the
// method is the usual shop practice (common practice, no single published source).
import { Link, Text, View } from "@react-pdf/renderer";
import { s } from "../styles";
import { Bullets } from "./parts";
import { FREE_SAG_NOTE, READINGS, READING_STEPS, SAG_FROM_READINGS, SAG_TERMS } from "@/lib/validations/sag-terms";
import { COLORS } from "../styles";
import { QrCode } from "./qr-code";

export const SAG_STEPS = [
  `Pick two fixed marks and always measure between the same two: at the rear, the axle centre and a mark on the rear fender or side panel straight above it; at the fork, the dust seal and the axle bracket (a cable tie around the inner tube against the seal makes it easy to read).`,
  ...READING_STEPS,
  `${SAG_FROM_READINGS} Write each reading in the boxes below, for the rear and the fork.`,
  FREE_SAG_NOTE,
  `Set ${SAG_TERMS.race.name.toLowerCase()} first with the shock preload collar, measure again, then check ${SAG_TERMS.static.name.toLowerCase()}. ${SAG_TERMS.static.name} below the window means the spring is too soft; above it, too stiff. Report your figures and we will confirm.`,
];

export const CAUTIONS = [
  "Springs and gas-charged shocks store energy. A compressed spring or a pressurised shock can release it suddenly and cause serious injury: never open, drill or heat a gas-charged shock, and use a proper spring compressor.",
  "Follow the manufacturer's service manual and your local rules for every step, or have a qualified technician do the work.",
  "Support the bike securely on a stand before working on the suspension.",
  "Before riding, re-check sag, the tightening torque of every fastener you touched (collars, clamps, axles, caps), the air pressure if fitted, and for leaks. Ride gently at first.",
];

export function SagSteps() {
  return (
    <View wrap={false}>
      <Text style={s.h2}>How to measure sag</Text>
      <Text style={{ marginBottom: 3 }}>
        Measure in millimetres on level ground, with two helpers. Each step uses the same two marks.
      </Text>
      <Bullets items={SAG_STEPS} numbered />
      <ReadingBoxes />
    </View>
  );
}

const BOX = { borderWidth: 1, borderColor: COLORS.ink, height: 20, marginHorizontal: 2 } as const;

/** Empty boxes to write the three readings (and the two sags worked out from them) per end. */
export function ReadingBoxes() {
  const columns = [
    `${READINGS.A.label}: ${READINGS.A.name}`,
    `${READINGS.B.label}: ${READINGS.B.name}`,
    `${READINGS.C.label}: ${READINGS.C.name}`,
    `${SAG_TERMS.static.name} ${SAG_TERMS.static.formula}`,
    `${SAG_TERMS.race.name} ${SAG_TERMS.race.formula}`,
  ];
  const width = "17%";
  return (
    <View style={{ marginTop: 6 }} wrap={false}>
      <Text style={s.h3}>Your readings (mm)</Text>
      <View style={{ flexDirection: "row", marginBottom: 2 }}>
        <Text style={{ width: "15%" }} />
        {columns.map((c) => (
          <Text key={c} style={[s.small, { width, paddingHorizontal: 2 }]}>
            {c}
          </Text>
        ))}
      </View>
      {["Rear (shock)", "Fork"].map((end) => (
        <View key={end} style={{ flexDirection: "row", alignItems: "center", marginBottom: 3 }}>
          <Text style={{ width: "15%", fontWeight: 600 }}>{end}</Text>
          {columns.map((c) => (
            <View key={c} style={[BOX, { width }]} />
          ))}
        </View>
      ))}
    </View>
  );
}

export function Cautions() {
  return (
    <View style={s.caution} wrap={false}>
      <Text style={s.cautionTitle}>Safety first: read before you start</Text>
      <Bullets items={CAUTIONS} />
    </View>
  );
}

export function NotesAndReport({
  notes,
  reportUrl,
  approved,
}: {
  notes: string | null;
  reportUrl: string | null;
  approved: boolean;
}) {
  return (
    <View wrap={false}>
      <Text style={s.h2}>Notes from your tuner</Text>
      <Text>{notes?.trim() ? notes.trim() : "No extra notes for this setup."}</Text>
      <Text style={s.h2}>Report your sag</Text>
      <Text>
        {approved && reportUrl
          ? "Once the springs are fitted and set, send us your measured free, static and race sag through your private link. It is for you only: do not share it."
          : "Preview only: the rider's private link appears here once the sheet is approved."}
      </Text>
      {approved && reportUrl ? (
        <View style={{ flexDirection: "row", alignItems: "center", gap: 10, marginTop: 4 }}>
          <QrCode text={reportUrl} width={84} />
          <View style={{ flex: 1 }}>
            <Text style={s.small}>Scan the code with your phone&apos;s camera, or open:</Text>
            <Link src={reportUrl} style={[s.link, { marginTop: 2 }]}>
              {reportUrl}
            </Link>
          </View>
        </View>
      ) : null}
    </View>
  );
}
