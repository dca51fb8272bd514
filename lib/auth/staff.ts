// Creating staff accounts outside the sign-up flow (open sign-up is off): the seed and, later, the
// admin's invitations. The password is hashed by better-auth's own hasher, so sign-in verifies it.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { findInviteByTokenHash, insertInvite, markInviteAccepted } from "@/db/queries/invites";
import { getShopName } from "@/db/queries/settings";
import { countActiveAdmins, findUserByEmail, getStaffMember } from "@/db/queries/team";
import { account, user } from "@/db/schema";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { appBaseUrl } from "@/lib/env";
import { sendTemplateEmail, type SendMailOptions } from "@/lib/mail";
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


// ---- Team administration (issue 7) ----
// Invitations: a random token goes out by e-mail; only its SHA-256 is stored, so a database reader
// cannot accept an invitation. Role changes and deactivation go through better-auth's admin plugin,
// whose banUser deletes every session of the user at once.

/** An invitation is valid for 7 days: long enough for a weekend, short enough to go stale safely. */
export const INVITE_DAYS = 7;

export const hashInviteToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function inviteStaff(
  input: { email: string; role: "tuner" | "admin" },
  inviter: { id: string; name: string },
  options: { mail?: SendMailOptions } = {},
) {
  const email = input.email.toLowerCase();
  const existing = await findUserByEmail(email);
  if (existing && existing.role !== "rider")
    throw new ConflictError("This person is already on the team.", { email: "Already a staff member" });
  const token = randomBytes(32).toString("base64url");
  const invite = await insertInvite({
    id: randomUUID(),
    email,
    role: input.role,
    tokenHash: hashInviteToken(token),
    invitedById: inviter.id,
    expiresAt: new Date(Date.now() + INVITE_DAYS * 24 * 3600 * 1000),
  });
  const url = new URL(`/invite/${token}`, appBaseUrl()).toString();
  const mail = await sendTemplateEmail(
    "staff-invite",
    { url, role: input.role, inviterName: inviter.name, shopName: await getShopName() },
    { to: email },
    options.mail,
  );
  return { id: invite.id, email, role: input.role, expiresAt: invite.expiresAt, mailStatus: mail.status };
}

/** The open invitation behind a token, or a domain error saying why it cannot be used. */
export async function openInvite(token: string) {
  const invite = await findInviteByTokenHash(hashInviteToken(token));
  if (!invite) throw new NotFoundError("This invitation link is not valid.");
  if (invite.acceptedAt) throw new ConflictError("This invitation has already been used. Sign in instead.");
  if (invite.expiresAt <= new Date()) throw new ConflictError("This invitation has expired. Ask the shop admin for a new one.");
  return invite;
}

/** Creates the staff account from an invitation; the caller then signs the person in. */
export async function acceptInvite(input: { token: string; name: string; password: string }) {
  const invite = await openInvite(input.token);
  const existing = await findUserByEmail(invite.email);
  if (existing && existing.role !== "rider")
    throw new ConflictError("An account with this e-mail already exists. Sign in instead.");
  if (!(await markInviteAccepted(invite.id))) throw new ConflictError("This invitation has already been used.");
  const role = invite.role === "admin" ? "admin" : "tuner";
  if (existing) {
    // A rider who becomes staff keeps their account; the role changes and a password is set.
    const db = await getDb();
    const hash = await (await (await getAuth()).$context).password.hash(input.password);
    await db.transaction(async (tx) => {
      await tx.update(user).set({ role, name: input.name, updatedAt: new Date() }).where(eq(user.id, existing.id));
      await tx.insert(account).values({ id: randomUUID(), userId: existing.id, accountId: existing.id, providerId: "credential", password: hash });
    });
    return { id: existing.id, email: invite.email, role };
  }
  const created = await ensureStaffUser({ email: invite.email, name: input.name, role, password: input.password });
  return { id: created.id, email: invite.email, role };
}

/** Refuses a change that would leave the shop with no admin who can sign in (409). */
async function guardLastAdmin(target: { role: string; banned: boolean | null }) {
  if (target.role === "admin" && !target.banned && (await countActiveAdmins()) <= 1)
    throw new ConflictError("The shop needs at least one active admin. Make someone else admin first.", {
      role: "Last active admin",
    });
}

export async function updateStaffMember(
  targetId: string,
  change: { role?: "tuner" | "admin"; active?: boolean },
  requestHeaders: Headers,
) {
  const target = await getStaffMember(targetId);
  if (!target) throw new NotFoundError("No such team member.");
  const auth = await getAuth();
  const demotes = change.role === "tuner" && target.role === "admin";
  const deactivates = change.active === false && !target.banned;
  if (demotes || deactivates) await guardLastAdmin(target);
  if (change.role && change.role !== target.role)
    await auth.api.setRole({ body: { userId: targetId, role: change.role }, headers: requestHeaders });
  if (deactivates) {
    // banUser marks the user banned and deletes their sessions; revoke again in case one was made between.
    await auth.api.banUser({ body: { userId: targetId, banReason: "Deactivated by a shop admin" }, headers: requestHeaders });
    await auth.api.revokeUserSessions({ body: { userId: targetId }, headers: requestHeaders });
  } else if (change.active === true && target.banned) {
    await auth.api.unbanUser({ body: { userId: targetId }, headers: requestHeaders });
  }
  return getStaffMember(targetId);
}
