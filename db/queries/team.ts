// Staff accounts (admins and tuners): the team page, and creating accounts outside better-auth's
// sign-up flow (open sign-up is off).
import { randomUUID } from "node:crypto";
import { and, asc, count, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb, type Executor, type Tx } from "@/db/client";
import { account as accountTable, user } from "@/db/schema";

export async function listStaff() {
  const db = await getDb();
  return db
    .select({
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      banned: user.banned,
      createdAt: user.createdAt,
    })
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

export interface CredentialAccount {
  email: string;
  name: string;
  role: "admin" | "tuner";
  /** Hashed by better-auth's own hasher, so its sign-in verifies it. */
  passwordHash: string;
}

/** A new staff user with a password sign-in, in the caller's transaction. Returns the user id. */
export async function insertStaffUser(tx: Tx, account: CredentialAccount): Promise<string> {
  const id = randomUUID();
  await tx
    .insert(user)
    .values({ id, email: account.email.toLowerCase(), name: account.name, role: account.role, emailVerified: true });
  await tx
    .insert(accountTable)
    .values({ id: randomUUID(), userId: id, accountId: id, providerId: "credential", password: account.passwordHash });
  return id;
}

/** A rider's account becomes staff: the role and name change and a password sign-in is added. */
export async function promoteToStaff(tx: Tx, userId: string, account: Omit<CredentialAccount, "email">) {
  await tx
    .update(user)
    .set({ role: account.role, name: account.name, updatedAt: new Date() })
    .where(eq(user.id, userId));
  await tx
    .insert(accountTable)
    .values({ id: randomUUID(), userId, accountId: userId, providerId: "credential", password: account.passwordHash });
}
