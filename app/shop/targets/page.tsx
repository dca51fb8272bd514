import type { Metadata } from "next";
import { DISCIPLINE_LABELS, SKILL_LABELS } from "@/lib/labels";
import Link from "next/link";
import { ClickerRulesEditor } from "@/components/targets/clicker-rules-editor";
import { TargetEditor } from "@/components/targets/target-editor";
import { listBikeModels } from "@/db/queries/bikes";
import { listClickerRules, listSetupTargets } from "@/db/queries/targets";
import { requireRole } from "@/lib/auth/guard";
import { defaultTargetValues } from "@/lib/shop/targets";
import { DISCIPLINES, SKILL_LEVELS, disciplineSchema, sizingDefaults, skillLevelSchema } from "@/lib/sizing";
import { ScrollBox } from "@/components/ui/scroll-box";

export const metadata: Metadata = { title: "Setup targets" };
export const dynamic = "force-dynamic";

const pct = (f: number) => `${(f * 100).toFixed(1)} %`;

export default async function TargetsPage({ searchParams }: { searchParams: Promise<{ d?: string; s?: string }> }) {
  await requireRole(["admin"], { page: "/shop/targets" });
  const sp = await searchParams;
  const discipline = disciplineSchema.catch("motocross").parse(sp.d);
  const skill = skillLevelSchema.catch("intermediate").parse(sp.s);
  const [rows, rules, bikes] = await Promise.all([listSetupTargets(), listClickerRules(), listBikeModels()]);
  const valuesOf = (d: typeof discipline, s: typeof skill) =>
    rows.find((r) => r.discipline === d && r.skill === s)?.values ?? defaultTargetValues(d, s);
  return (
    <div className="flex flex-col gap-5">
      <h1 className="text-2xl font-bold">Setup targets</h1>
      <p className="max-w-3xl text-sm text-stone-700">
        Your shop&apos;s sag targets and spring factors per discipline and skill. The starting figures are the
        engine&apos;s defaults (common practice and values from memory): tune them to your philosophy. Choose a row to
        edit it.
      </p>
      <ScrollBox label="Targets per discipline and skill" className="rounded-xl border border-stone-200 bg-white">
        <table className="w-full text-left text-sm tabular-nums">
          <caption className="sr-only">Targets per discipline and skill</caption>
          <thead className="bg-stone-100 text-stone-700">
            <tr>
              <th scope="col" className="px-2 py-2">
                Discipline, skill
              </th>
              <th scope="col" className="px-2">
                Rear race
              </th>
              <th scope="col" className="px-2">
                Rear static
              </th>
              <th scope="col" className="px-2">
                Fork race
              </th>
              <th scope="col" className="px-2">
                Fork static
              </th>
              <th scope="col" className="px-2">
                Rear share
              </th>
              <th scope="col" className="px-2">
                Rate ×
              </th>
              <th scope="col" className="px-2">
                Bottoming ×
              </th>
            </tr>
          </thead>
          <tbody>
            {DISCIPLINES.flatMap((d) =>
              SKILL_LEVELS.map((s) => {
                const v = valuesOf(d, s);
                const current = d === discipline && s === skill;
                return (
                  <tr key={`${d}-${s}`} className={`border-t border-stone-100 ${current ? "bg-pine-50" : ""}`}>
                    <th scope="row" className="px-2 py-1 font-normal">
                      <Link
                        href={`/shop/targets?d=${d}&s=${s}`}
                        aria-current={current ? "true" : undefined}
                        className="inline-flex min-h-11 items-center text-pine-700 underline"
                      >
                        {DISCIPLINE_LABELS[d]}, {SKILL_LABELS[s].toLowerCase()}
                      </Link>
                    </th>
                    <td className="px-2">{pct(v.sag.rearRace)}</td>
                    <td className="px-2">
                      {pct(v.sag.rearStaticMin)}–{pct(v.sag.rearStaticMax)}
                    </td>
                    <td className="px-2">{pct(v.sag.forkRace)}</td>
                    <td className="px-2">
                      {pct(v.sag.forkStaticMin)}–{pct(v.sag.forkStaticMax)}
                    </td>
                    <td className="px-2">{v.riderRearShare}</td>
                    <td className="px-2">{v.rateFactor}</td>
                    <td className="px-2">{v.bottomingFactor}</td>
                  </tr>
                );
              }),
            )}
          </tbody>
        </table>
      </ScrollBox>
      <TargetEditor
        key={`${discipline}-${skill}`}
        discipline={discipline}
        skill={skill}
        saved={valuesOf(discipline, skill)}
        bikes={bikes.map((b) => ({
          id: b.id,
          name: b.name,
          rearTravelMm: b.rearWheelTravelMm,
          forkTravelMm: b.spec.fork.travelMm,
        }))}
      />
      <ClickerRulesEditor initial={rules.length ? rules : sizingDefaults.DEFAULT_CLICKER_RULES} />
    </div>
  );
}
