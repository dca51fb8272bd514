// Staff accounts (admins and tuners): the team page, and creating accounts outside better-auth's
// sign-up flow (open sign-up is off).
import { randomUUID } from "node:crypto";
import { and, asc, count, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb } from "@/db/client";
import { account as accountTable, staffInvites, user } from "@/db/schema";
import { inTransaction, type Tx } from "./transaction";

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

export async function findUserByEmail(email: string) {
  const db = await getDb();
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

type Writer = Pick<Tx, "insert" | "update">;

async function writeCredentialAccount(db: Writer, account: CredentialAccount, existingUserId?: string): Promise<string> {
  const id = existingUserId ?? randomUUID();
  if (existingUserId) {
    await db.update(user).set({ role: account.role, name: account.name, updatedAt: new Date() }).where(eq(user.id, id));
  } else {
    await db.insert(user).values({ id, email: account.email.toLowerCase(), name: account.name, role: account.role, emailVerified: true });
  }
  await db.insert(accountTable).values({ id: randomUUID(), userId: id, accountId: id, providerId: "credential", password: account.passwordHash });
  return id;
}

/** A new staff user with a password sign-in, in one transaction. Returns the user id. */
export async function insertStaffAccount(account: CredentialAccount): Promise<string> {
  return inTransaction((tx) => writeCredentialAccount(tx, account));
}

/**
 * Marks the invitation used and creates the account (or gives an existing rider account the role
 * and a password) in one transaction: null when the invitation was used first, and then nothing is
 * written; if creating the account fails, the invitation stays open.
 */
export async function acceptInviteWithAccount(
  inviteId: string,
  account: CredentialAccount,
  existingUserId?: string,
): Promise<string | null> {
  return inTransaction(async (tx) => {
    const marked = await tx
      .update(staffInvites)
      .set({ acceptedAt: new Date() })
      .where(and(eq(staffInvites.id, inviteId), isNull(staffInvites.acceptedAt)))
      .returning({ id: staffInvites.id });
    if (marked.length === 0) return null;
    return writeCredentialAccount(tx, account, existingUserId);
  });
}
