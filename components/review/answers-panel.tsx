// The rider's answers exactly as given, units included (the engine's SI input is elsewhere).
import type { ReactNode } from "react";
import {
  COMPLAINT_LABELS,
  JUMP_LABELS,
  SKILL_LABELS,
  STYLE_SHORT_LABELS,
  TERRAIN_LABELS,
  disciplineLabel,
  labelOf,
} from "@/lib/labels";
import type { RequestAnswers } from "@/lib/validations/request";

type Answers = Partial<{ [K in keyof RequestAnswers]: Partial<RequestAnswers[K]> }>;

const withUnit = (v: { value: number; unit: string } | undefined) => (v ? `${v.value} ${v.unit}` : undefined);

const SAG_WORDS = {
  rearStatic: "shock static",
  rearRace: "shock race",
  forkStatic: "fork static",
  forkRace: "fork race",
} as const;

function Row({ label, children }: { label: string; children: ReactNode }) {
  if (children === undefined || children === null || children === "") return null;
  return (
    <div className="grid grid-cols-[minmax(0,8rem)_minmax(0,1fr)] gap-2 border-t border-stone-100 py-1.5 first:border-t-0 sm:grid-cols-[10rem_minmax(0,1fr)]">
      <dt className="text-stone-600">{label}</dt>
      <dd className="wrap-anywhere text-stone-900">{children}</dd>
    </div>
  );
}

export function AnswersPanel({ answers, bikeLabel }: { answers: unknown; bikeLabel: string }) {
  const a = (answers ?? {}) as Answers;
  const sag = a.feel?.currentSag;
  const sagText = sag
    ? (["rearStatic", "rearRace", "forkStatic", "forkRace"] as const)
        .filter((k) => sag[k] !== undefined)
        .map((k) => `${SAG_WORDS[k]} ${sag[k]} ${sag.unit}`)
        .join(", ")
    : undefined;
  const nl = a.bike?.notListed;
  return (
    <section aria-labelledby="answers-heading" className="rounded-xl border border-stone-200 bg-white p-4">
      <h2 id="answers-heading" className="mb-2 text-lg font-semibold">
        Rider&apos;s answers (as given)
      </h2>
      <dl className="text-sm">
        <Row label="Name">{a.rider?.name}</Row>
        <Row label="E-mail">{a.rider?.email}</Row>
        <Row label="Phone">{a.rider?.phone}</Row>
        <Row label="Weight">
          {a.rider?.weight
            ? `${withUnit(a.rider.weight)} ${a.rider.gearIncluded ? "with riding gear" : "without gear"}`
            : undefined}
        </Row>
        <Row label="Height">{withUnit(a.rider?.height)}</Row>
        <Row label="Skill, style">
          {[
            a.rider?.skill && labelOf(SKILL_LABELS, a.rider.skill),
            a.rider?.style && labelOf(STYLE_SHORT_LABELS, a.rider.style),
          ]
            .filter(Boolean)
            .join(", ")}
        </Row>
        <Row label="Discipline">{a.riding?.discipline ? disciplineLabel(a.riding.discipline) : undefined}</Row>
        <Row label="Terrain">{a.riding?.terrain?.map((t) => labelOf(TERRAIN_LABELS, t)).join(", ")}</Row>
        <Row label="Jumps">{a.riding?.jumpSize ? labelOf(JUMP_LABELS, a.riding.jumpSize) : undefined}</Row>
        <Row label="Hours per month">{a.riding?.hoursPerMonth}</Row>
        <Row label="Bike">{`${bikeLabel}${a.bike?.year ? ` (${a.bike.year})` : ""}`}</Row>
        <Row label="Not in catalog">
          {nl
            ? `${nl.description}; rear travel ${withUnit(nl.rearWheelTravel)}, fork travel ${withUnit(nl.forkTravel)}${nl.mass ? `, ${withUnit(nl.mass)}` : ""}`
            : undefined}
        </Row>
        <Row label="Fork spring now">{withUnit(a.bike?.currentForkSpring)}</Row>
        <Row label="Shock spring now">{withUnit(a.bike?.currentShockSpring)}</Row>
        <Row label="Modifications">{a.bike?.modifications}</Row>
        <Row label="Complaints">
          {a.feel?.complaints?.length ? a.feel.complaints.map((c) => labelOf(COMPLAINT_LABELS, c)).join(", ") : "none"}
        </Row>
        <Row label="Rider's notes">
          {a.feel?.notes ? <span className="whitespace-pre-line">{a.feel.notes}</span> : undefined}
        </Row>
        <Row label="Sag measured now">{sagText}</Row>
      </dl>
    </section>
  );
}
