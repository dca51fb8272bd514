// The rider's answers as given, units included: on the review step and on the status page.
import {
  COMPLAINT_LABELS,
  DISCIPLINE_LABELS,
  JUMP_LABELS,
  SKILL_LABELS,
  STYLE_LABELS,
  TERRAIN_LABELS,
  label,
} from "@/components/request-form/labels";
import type { ReactNode } from "react";

type Loose = Record<string, unknown> | undefined;
const obj = (v: unknown): Loose => (v && typeof v === "object" ? (v as Record<string, unknown>) : undefined);
const measure = (v: unknown) => {
  const m = obj(v);
  return m && m.value !== undefined && m.value !== "" ? `${m.value} ${m.unit}` : null;
};
const list = (labels: Record<string, string>, v: unknown) =>
  Array.isArray(v) && v.length ? v.map((x) => label(labels, x)).join(", ") : null;

export interface AnswersListProps {
  answers: unknown;
  /** The bike's name when the rider picked one from the catalog. */
  bikeLabel?: string | null;
  /** Renders an "Edit" control per section (the review step). */
  edit?: (section: "rider" | "riding" | "bike" | "feel") => ReactNode;
}

function Section({ title, rows, action }: { title: string; rows: [string, ReactNode][]; action?: ReactNode }) {
  const shown = rows.filter(([, v]) => v !== null && v !== undefined && v !== "");
  return (
    <section className="rounded-xl border border-stone-200 bg-white p-4">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-lg font-semibold">{title}</h3>
        {action}
      </div>
      <dl className="mt-2 grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-[12rem_1fr]">
        {shown.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-sm text-stone-600">{k}</dt>
            <dd className="mb-2 break-words sm:mb-0">{v}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

export function AnswersList({ answers, bikeLabel, edit }: AnswersListProps) {
  const a = obj(answers) ?? {};
  const rider = obj(a.rider) ?? {};
  const riding = obj(a.riding) ?? {};
  const bike = obj(a.bike) ?? {};
  const feel = obj(a.feel) ?? {};
  const notListed = obj(bike.notListed);
  const sag = obj(feel.currentSag);
  const sagText = sag
    ? (["rearStatic", "rearRace", "forkStatic", "forkRace"] as const)
        .filter((k) => sag[k] !== undefined && sag[k] !== "")
        .map(
          (k) =>
            `${{ rearStatic: "rear static sag", rearRace: "rear race sag", forkStatic: "front static sag", forkRace: "front race sag" }[k]} ${sag[k]} ${sag.unit}`,
        )
        .join(", ") || null
    : null;
  const rate = (v: unknown) => measure(v);
  return (
    <div className="flex flex-col gap-3">
      <Section
        title="You"
        action={edit?.("rider")}
        rows={[
          ["Name", rider.name as string],
          ["E-mail", rider.email as string],
          ["Phone", (rider.phone as string) || null],
          [
            "Weight",
            measure(rider.weight) && `${measure(rider.weight)} (${rider.gearIncluded ? "with gear" : "without gear"})`,
          ],
          ["Height", measure(rider.height)],
          ["Skill", label(SKILL_LABELS, rider.skill)],
          ["Style", label(STYLE_LABELS, rider.style)],
        ]}
      />
      <Section
        title="Riding"
        action={edit?.("riding")}
        rows={[
          ["Discipline", label(DISCIPLINE_LABELS, riding.discipline)],
          ["Terrain", list(TERRAIN_LABELS, riding.terrain)],
          ["Jumps", label(JUMP_LABELS, riding.jumpSize)],
          [
            "Hours a month",
            riding.hoursPerMonth !== undefined && riding.hoursPerMonth !== "" ? String(riding.hoursPerMonth) : null,
          ],
        ]}
      />
      <Section
        title="Bike"
        action={edit?.("bike")}
        rows={[
          ["Bike", notListed ? `${notListed.description} (not in the shop's list)` : (bikeLabel ?? null)],
          ["Rear wheel travel", notListed ? measure(notListed.rearWheelTravel) : null],
          ["Fork travel", notListed ? measure(notListed.forkTravel) : null],
          ["Bike weight", notListed ? measure(notListed.mass) : null],
          ["Year", bike.year !== undefined && bike.year !== "" ? String(bike.year) : null],
          ["Fork spring now", rate(bike.currentForkSpring)],
          ["Shock spring now", rate(bike.currentShockSpring)],
          ["Modifications", (bike.modifications as string) || null],
        ]}
      />
      <Section
        title="How it feels"
        action={edit?.("feel")}
        rows={[
          ["Complaints", list(COMPLAINT_LABELS, feel.complaints) ?? "None ticked"],
          ["Notes", (feel.notes as string) || null],
          ["Sag measured", sagText],
        ]}
      />
    </div>
  );
}
