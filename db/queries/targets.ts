// A shop's setup targets (one row per discipline and skill) and its clicker rules.
import { and, asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { clickerRules, setupTargets } from "@/db/schema";
import type { TargetRowValues } from "@/lib/requests/sizing-input";
import { clickerRuleSchema, type ClickerRule, type Discipline, type SkillLevel } from "@/lib/sizing";

export async function listSetupTargets() {
  const db = await getDb();
  const rows = await db.select().from(setupTargets);
  return rows.map((r) => ({
    discipline: r.discipline as Discipline,
    skill: r.skill as SkillLevel,
    values: r.values,
    updatedAt: r.updatedAt,
  }));
}

export async function getSetupTarget(discipline: Discipline, skill: SkillLevel): Promise<TargetRowValues | null> {
  const db = await getDb();
  const [row] = await db
    .select({ values: setupTargets.values })
    .from(setupTargets)
    .where(and(eq(setupTargets.discipline, discipline), eq(setupTargets.skill, skill)));
  return row?.values ?? null;
}

export async function saveSetupTarget(discipline: Discipline, skill: SkillLevel, values: TargetRowValues) {
  const db = await getDb();
  await db
    .insert(setupTargets)
    .values({ discipline, skill, values })
    .onConflictDoUpdate({
      target: [setupTargets.discipline, setupTargets.skill],
      set: { values, updatedAt: new Date() },
    });
}

export async function listClickerRules(): Promise<ClickerRule[]> {
  const db = await getDb();
  const rows = await db.select({ rule: clickerRules.rule }).from(clickerRules).orderBy(asc(clickerRules.sortOrder));
  return rows.map((r) => clickerRuleSchema.parse(r.rule) as ClickerRule);
}

/** Replaces the whole table in one transaction: the order is part of the rules. */
export async function replaceClickerRules(rules: ClickerRule[]) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.delete(clickerRules);
    if (rules.length) await tx.insert(clickerRules).values(rules.map((rule, i) => ({ rule, sortOrder: i })));
  });
}
