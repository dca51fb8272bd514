// Creating staff accounts outside the sign-up flow (open sign-up is off): the seed and the admin's
// invitations. The password is hashed by better-auth's own hasher, so sign-in verifies it.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import {
  findInviteByTokenHash,
  insertInvite,
  lockInvite,
  markInviteAccepted,
  renewInvite,
  revokeInvite,
} from "@/db/queries/invites";
import { getShopName } from "@/db/queries/settings";
import { countActiveAdmins, findUserByEmail, getStaffMember, insertStaffUser, promoteToStaff } from "@/db/queries/team";
import { inTransaction } from "@/db/queries/transaction";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { appBaseUrl } from "@/lib/env";
import { kickOutbox, queueTemplateEmail } from "@/lib/mail";
import type { Role } from "./roles";
import { getAuth } from "./server";

interface StaffAccount {
  email: string;
  name: string;
  role: Extract<Role, "admin" | "tuner">;
  password: string;
}

/** better-auth's own hash of a password, so its sign-in verifies it. */
async function hashPassword(password: string): Promise<string> {
  return (await (await getAuth()).$context).password.hash(password);
}

/** Creates the account if its e-mail is new; returns the user id and whether it was created. */
export async function ensureStaffUser(input: StaffAccount): Promise<{ id: string; created: boolean }> {
  const existing = await findUserByEmail(input.email);
  if (existing) return { id: existing.id, created: false };
  const passwordHash = await hashPassword(input.password);
  const id = await inTransaction((tx) =>
    insertStaffUser(tx, { email: input.email, name: input.name, role: input.role, passwordHash }),
  );
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
) {
  const email = input.email.toLowerCase();
  const existing = await findUserByEmail(email);
  if (existing && existing.role !== "rider")
    throw new ConflictError("This person is already on the team.", { email: "Already a staff member" });
  const token = randomBytes(32).toString("base64url");
  const url = new URL(`/invite/${token}`, appBaseUrl()).toString();
  // The invitation and its e-mail are stored together: neither exists without the other.
  const { invite, mail } = await inTransaction(async (tx) => {
    const invite = await insertInvite(
      {
        id: randomUUID(),
        email,
        role: input.role,
        tokenHash: hashInviteToken(token),
        invitedById: inviter.id,
        expiresAt: new Date(Date.now() + INVITE_DAYS * 24 * 3600 * 1000),
      },
      tx,
    );
    const mail = await queueTemplateEmail(
      tx,
      "staff-invite",
      { url, role: input.role, inviterName: inviter.name, shopName: await getShopName(tx) },
      { to: email },
    );
    return { invite, mail };
  });
  kickOutbox();
  return { id: invite.id, email, role: input.role, expiresAt: invite.expiresAt, mailStatus: mail.status };
}

/**
 * Sends an open invitation again with a fresh link (the old link stops working: only the hash of
 * the newest token is kept) and a fresh 7 days.
 */
export async function resendInvite(id: string, inviter: { id: string; name: string }) {
  const token = randomBytes(32).toString("base64url");
  const url = new URL(`/invite/${token}`, appBaseUrl()).toString();
  const { invite, mail } = await inTransaction(async (tx) => {
    const invite = await renewInvite(tx, id, {
      tokenHash: hashInviteToken(token),
      expiresAt: new Date(Date.now() + INVITE_DAYS * 24 * 3600 * 1000),
    });
    if (!invite) throw new NotFoundError("This invitation was used or withdrawn meanwhile.");
    const role = invite.role === "admin" ? "admin" : "tuner";
    const mail = await queueTemplateEmail(
      tx,
      "staff-invite",
      { url, role, inviterName: inviter.name, shopName: await getShopName(tx) },
      { to: invite.email },
    );
    return { invite, mail };
  });
  kickOutbox();
  return {
    id: invite.id,
    email: invite.email,
    role: invite.role,
    expiresAt: invite.expiresAt,
    mailStatus: mail.status,
  };
}

/** Withdraws an open invitation: its link stops working at once. */
export async function withdrawInvite(id: string) {
  const invite = await revokeInvite(id);
  if (!invite) throw new NotFoundError("This invitation was used or withdrawn meanwhile.");
  return { id: invite.id, email: invite.email };
}

/** The open invitation behind a token, or a domain error saying why it cannot be used. */
export async function openInvite(token: string) {
  const invite = await findInviteByTokenHash(hashInviteToken(token));
  if (!invite) throw new NotFoundError("This invitation link is not valid.");
  if (invite.acceptedAt) throw new ConflictError("This invitation has already been used. Sign in instead.");
  if (invite.revokedAt)
    throw new ConflictError("This invitation was withdrawn by the shop. Ask the shop admin for a new one.");
  if (invite.expiresAt <= new Date())
    throw new ConflictError("This invitation has expired. Ask the shop admin for a new one.");
  return invite;
}

/**
 * Creates the staff account from an invitation; the caller then signs the person in. One
 * transaction: the invitation row is locked, the account is created (or a rider's account promoted)
 * and the invitation marked used together, so a failure leaves the invitation open and two people
 * racing on one link cannot both get an account.
 */
export async function acceptInvite(input: { token: string; name: string; password: string }) {
  const opened = await openInvite(input.token);
  const role = opened.role === "admin" ? "admin" : "tuner";
  // Hashed before the transaction: it is slow on purpose and needs no lock.
  const passwordHash = await hashPassword(input.password);
  const id = await inTransaction(async (tx) => {
    const invite = await lockInvite(tx, opened.id);
    if (!invite || invite.acceptedAt) throw new ConflictError("This invitation has already been used.");
    const existing = await findUserByEmail(invite.email, tx);
    if (existing && existing.role !== "rider")
      throw new ConflictError("An account with this e-mail already exists. Sign in instead.");
    let userId: string;
    if (existing) {
      // A rider who becomes staff keeps their account; the role changes and a password is set.
      await promoteToStaff(tx, existing.id, { name: input.name, role, passwordHash });
      userId = existing.id;
    } else {
      userId = await insertStaffUser(tx, { email: invite.email, name: input.name, role, passwordHash });
    }
    if (!(await markInviteAccepted(invite.id, tx))) throw new ConflictError("This invitation has already been used.");
    return userId;
  });
  return { id, email: opened.email, role };
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
    await auth.api.banUser({
      body: { userId: targetId, banReason: "Deactivated by a shop admin" },
      headers: requestHeaders,
    });
    await auth.api.revokeUserSessions({ body: { userId: targetId }, headers: requestHeaders });
  } else if (change.active === true && target.banned) {
    await auth.api.unbanUser({ body: { userId: targetId }, headers: requestHeaders });
  }
  return getStaffMember(targetId);
}
