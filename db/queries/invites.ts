// Staff invitations: only the SHA-256 of the e-mailed token is stored.
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { staffInvites } from "@/db/schema";

export type StaffInviteRow = typeof staffInvites.$inferSelect;

export async function insertInvite(values: typeof staffInvites.$inferInsert, executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db.insert(staffInvites).values(values).returning();
  return row!;
}

/** Open invitations (not accepted, not expired), newest first. */
export async function listOpenInvites(now = new Date()) {
  const db = await getDb();
  return db
    .select({
      id: staffInvites.id,
      email: staffInvites.email,
      role: staffInvites.role,
      expiresAt: staffInvites.expiresAt,
      createdAt: staffInvites.createdAt,
    })
    .from(staffInvites)
    .where(and(isNull(staffInvites.acceptedAt), isNull(staffInvites.revokedAt), gt(staffInvites.expiresAt, now)))
    .orderBy(desc(staffInvites.createdAt));
}

const openNow = (id: string) =>
  and(eq(staffInvites.id, id), isNull(staffInvites.acceptedAt), isNull(staffInvites.revokedAt));

/** A new token and expiry for an invitation not yet used or withdrawn; null when there is none. */
export async function renewInvite(
  tx: Executor,
  id: string,
  values: { tokenHash: string; expiresAt: Date },
): Promise<StaffInviteRow | null> {
  const [row] = await tx.update(staffInvites).set(values).where(openNow(id)).returning();
  return row ?? null;
}

/** Withdraws an invitation not yet used; null when there is none to withdraw. */
export async function revokeInvite(id: string, executor?: Executor): Promise<StaffInviteRow | null> {
  const db = executor ?? (await getDb());
  const [row] = await db.update(staffInvites).set({ revokedAt: new Date() }).where(openNow(id)).returning();
  return row ?? null;
}

export async function findInviteByTokenHash(tokenHash: string): Promise<StaffInviteRow | null> {
  const db = await getDb();
  const [row] = await db.select().from(staffInvites).where(eq(staffInvites.tokenHash, tokenHash));
  return row ?? null;
}

/** The invitation, locked for the caller's transaction (accepting it). */
export async function lockInvite(tx: Executor, id: string): Promise<StaffInviteRow | null> {
  const [row] = await tx.select().from(staffInvites).where(eq(staffInvites.id, id)).for("update");
  return row ?? null;
}

/** Marks the invitation used; false when someone used it first (or it was withdrawn meanwhile). */
export async function markInviteAccepted(id: string, executor?: Executor): Promise<boolean> {
  const db = executor ?? (await getDb());
  const rows = await db
    .update(staffInvites)
    .set({ acceptedAt: new Date() })
    .where(openNow(id))
    .returning({ id: staffInvites.id });
  return rows.length > 0;
}
