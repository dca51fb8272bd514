// The shop's wording per rider e-mail template: read when an e-mail is built, written by the owner.
import { eq } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { emailWording } from "@/db/schema";

export type EmailWordingRow = typeof emailWording.$inferSelect;

export async function findEmailWording(template: string, executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db
    .select({ heading: emailWording.heading, intro: emailWording.intro })
    .from(emailWording)
    .where(eq(emailWording.template, template));
  return row ?? null;
}

export async function listEmailWording(): Promise<EmailWordingRow[]> {
  const db = await getDb();
  return db.select().from(emailWording);
}

/** Creates or replaces one template's wording; null fields go back to the template's own words. */
export async function saveEmailWording(
  template: string,
  values: { heading: string | null; intro: string | null },
  updatedBy: string,
): Promise<EmailWordingRow> {
  const db = await getDb();
  const row = { template, ...values, updatedBy, updatedAt: new Date() };
  const [saved] = await db
    .insert(emailWording)
    .values(row)
    .onConflictDoUpdate({ target: emailWording.template, set: row })
    .returning();
  return saved!;
}
