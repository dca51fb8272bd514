// The one set of sag words every rider-facing place uses: the request form, the status page and its
// guide, the sag report, the setup sheet and the e-mails. The terms are the trade's (common
// practice): the end's length is read three times between the same two marks, and sag is how far
// the end settles from fully extended.
//   reading A: fully extended, the wheel hanging free (bike on a stand): no sag, the zero.
//   reading B: the bike standing on its own weight, no rider.
//   reading C: the rider aboard in full gear, in the riding position.
//   static sag = A − B; race sag = A − C; free sag is the static reading taken the lazy way
//   (lifted a little and let settle by itself, no push), which reads a little less than static sag
//   because of friction in seals, bushings and linkage: the gap tells the tuner about friction.

export type SagTerm = "free" | "static" | "race";
export type ReadingLabel = "A" | "B" | "C";

export const READINGS: Record<ReadingLabel, { label: ReadingLabel; name: string; how: string }> = {
  A: {
    label: "A",
    name: "fully extended",
    how: "Bike on a stand, wheel hanging free. Measure between the two marks.",
  },
  B: {
    label: "B",
    name: "on its own weight",
    how: "Bike off the stand, standing on its wheels under its own weight, no rider. Push it down a little and let it rise, then lift it a little and let it settle; use the average of the two.",
  },
  C: {
    label: "C",
    name: "you aboard",
    how: "You sit on the bike in full gear, feet on the pegs, in your riding position, a helper holding it upright. A second helper measures, with the same push-and-lift average.",
  },
};

export const SAG_TERMS: Record<SagTerm, { name: string; meaning: string; formula: string }> = {
  static: {
    name: "Static sag",
    meaning: "the bike on its own weight, no rider",
    formula: "A − B",
  },
  race: {
    name: "Race sag",
    meaning: "you aboard in full gear",
    formula: "A − C",
  },
  free: {
    name: "Free sag",
    meaning: "the bike on its own weight, lifted a little and let settle by itself, without a push",
    formula: "A − B, lifted only",
  },
};

/** "Static sag (A − B: the bike on its own weight, no rider)". */
export function sagTermWithMeaning(term: SagTerm): string {
  const t = SAG_TERMS[term];
  return `${t.name} (${t.formula}: ${t.meaning})`;
}

/** "Rear static sag", "Front race sag": the label of one reading in a form. */
export function endSagLabel(end: "front" | "rear", term: SagTerm): string {
  return `${end === "front" ? "Front" : "Rear"} ${SAG_TERMS[term].name.toLowerCase()}`;
}

/** The sheet and the guide: the three readings in order, as steps a rider follows. */
export const READING_STEPS: string[] = (["A", "B", "C"] as const).map(
  (key) => `Reading ${key}, ${READINGS[key].name}: ${READINGS[key].how}`,
);

export const SAG_FROM_READINGS = `${SAG_TERMS.static.name} = ${SAG_TERMS.static.formula}. ${SAG_TERMS.race.name} = ${SAG_TERMS.race.formula}.`;

export const FREE_SAG_NOTE = `${SAG_TERMS.free.name} (optional): ${SAG_TERMS.free.meaning}; subtract that reading from A. It reads a little less than static sag, and the gap tells the tuner about friction in seals and linkage.`;
