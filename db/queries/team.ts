// Staff accounts (admins and tuners) for the team page.
import { and, asc, count, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { user } from "@/db/schema";

export async function listStaff() {
  const db = await getDb();
  return db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, banned: user.banned, createdAt: user.createdAt })
    .from(user)
    .where(inArray(user.role, ["admin", "tuner"]))
    .orderBy(asc(user.name));
}

export async function getStaffMember(id: string) {
  const db = await getDb();
  const [row] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, banned: user.banned })
    .from(user)
    .where(and(eq(user.id, id), inArray(user.role, ["admin", "tuner"])));
  return row ?? null;
}

export async function findUserByEmail(email: string, executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db.select({ id: user.id, role: user.role }).from(user).where(eq(user.email, email.toLowerCase()));
  return row ?? null;
}

/** Admins who can still sign in. */
export async function countActiveAdmins(): Promise<number> {
  const db = await getDb();
  const [row] = await db
    .select({ n: count() })
    .from(user)
    .where(and(eq(user.role, "admin"), or(isNull(user.banned), eq(user.banned, false))));
  return Number(row?.n ?? 0);
}
