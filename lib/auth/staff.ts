// Creating staff accounts outside the sign-up flow (open sign-up is off): the seed and, later, the
// admin's invitations. The password is hashed by better-auth's own hasher, so sign-in verifies it.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { account, user } from "@/db/schema";
import type { Role } from "./roles";
import { getAuth } from "./server";

interface StaffAccount {
  email: string;
  name: string;
  role: Extract<Role, "admin" | "tuner">;
  password: string;
}

/** Creates the account if its e-mail is new; returns the user id and whether it was created. */
export async function ensureStaffUser(input: StaffAccount): Promise<{ id: string; created: boolean }> {
  const db = await getDb();
  const email = input.email.toLowerCase();
  const existing = await db.select({ id: user.id }).from(user).where(eq(user.email, email)).limit(1);
  if (existing[0]) return { id: existing[0].id, created: false };

  const ctx = await (await getAuth()).$context;
  const hash = await ctx.password.hash(input.password);
  const id = randomUUID();
  await db.transaction(async (tx) => {
    await tx.insert(user).values({ id, email, name: input.name, role: input.role, emailVerified: true });
    await tx.insert(account).values({
      id: randomUUID(),
      userId: id,
      accountId: id,
      providerId: "credential",
      password: hash,
    });
  });
  return { id, created: true };
}

