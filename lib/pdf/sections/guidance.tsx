// How to measure sag, the rider's link to report it, and the safety cautions. Our own wording; the
// method is the usual shop practice (common practice, no single published source).
import { Link, Text, View } from "@react-pdf/renderer";
import { s } from "../styles";
import { Bullets } from "./parts";

export const SAG_STEPS = [
  "Free sag (rear): put the bike on a stand so the rear wheel hangs free. Measure straight up from the rear axle centre to a fixed mark on the rear fender or side panel. Write it down as A.",
  "Static sag: take the bike off the stand and let it settle on its wheels under its own weight, no rider. Measure the same two points again: B. Static sag = A − B.",
  "Race sag: sit on the bike in full gear in your riding position, feet on the pegs, with a helper holding the bike upright. A second helper measures again: C. Race sag = A − C.",
  "Friction makes the bike settle at slightly different heights: for each reading, push the bike down a little and let it rise, then lift it a little and let it settle, and use the average of the two.",
  "Fork: measure the same three states along the fork, the exposed length of the inner tube from the dust seal to the axle bracket; a cable tie around the tube against the seal makes it easy to read.",
  "Set race sag first with the shock preload collar, re-measure, then check static sag. Static sag below the window means the spring is too soft; above it, too stiff. Report your figures and we will confirm.",
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
  reportUrl: string;
  approved: boolean;
}) {
  return (
    <View wrap={false}>
      <Text style={s.h2}>Notes from your tuner</Text>
      <Text>{notes?.trim() ? notes.trim() : "No extra notes for this setup."}</Text>
      <Text style={s.h2}>Report your sag</Text>
      <Text>
        {approved
          ? "Once the springs are fitted and set, send us your measured free, static and race sag through your private link. It is for you only: do not share it."
          : "Preview only: the rider's private link appears here once the sheet is approved."}
      </Text>
      <Link src={reportUrl} style={[s.link, { marginTop: 2 }]}>
        {reportUrl}
      </Link>
    </View>
  );
}
