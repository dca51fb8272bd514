// Creating staff accounts outside the sign-up flow (open sign-up is off): the seed and the admin's
// invitations. The password is hashed by better-auth's own hasher, so sign-in verifies it.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { findInviteByTokenHash, insertInvite } from "@/db/queries/invites";
import { getShopName } from "@/db/queries/settings";
import {
  acceptInviteWithAccount,
  countActiveAdmins,
  findUserByEmail,
  getStaffMember,
  insertStaffAccount,
} from "@/db/queries/team";
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

const hashPassword = async (password: string) => (await (await getAuth()).$context).password.hash(password);

/** Creates the account if its e-mail is new; returns the user id and whether it was created. */
export async function ensureStaffUser(input: StaffAccount): Promise<{ id: string; created: boolean }> {
  const existing = await findUserByEmail(input.email);
  if (existing) return { id: existing.id, created: false };
  const id = await insertStaffAccount({ ...input, passwordHash: await hashPassword(input.password) });
  return { id, created: true };
}

// Team administration.
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

/**
 * Creates the staff account from an invitation, marking the invitation used in the same
 * transaction; the caller then signs the person in.
 */
export async function acceptInvite(input: { token: string; name: string; password: string }) {
  const invite = await openInvite(input.token);
  const existing = await findUserByEmail(invite.email);
  // A rider who becomes staff keeps their account; the role changes and a password is set.
  if (existing && existing.role !== "rider")
    throw new ConflictError("An account with this e-mail already exists. Sign in instead.");
  const role = invite.role === "admin" ? "admin" : "tuner";
  const account = { email: invite.email, name: input.name, role, passwordHash: await hashPassword(input.password) } as const;
  const id = await acceptInviteWithAccount(invite.id, account, existing?.id);
  if (!id) throw new ConflictError("This invitation has already been used.");
  return { id, email: invite.email, role };
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
