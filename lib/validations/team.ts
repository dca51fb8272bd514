// Team administration: invitations, role changes, deactivation, accepting an invitation.
import { z } from "zod";
import { text } from "./text";

export const staffRoleSchema = z.enum(["tuner", "admin"], { message: "Choose tuner or admin" });

export const inviteSchema = z.object({
  email: text()
    .trim()
    .toLowerCase()
    .min(1, "Enter the person's e-mail address")
    .max(254, "An e-mail address has at most 254 characters")
    .email("This is not an e-mail address: it needs a name, an @ and a domain, like sam@example.com"),
  role: staffRoleSchema,
});

export const memberUpdateSchema = z
  .object({ role: staffRoleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: "Give a role or active", path: ["role"] });

export const acceptInviteSchema = z.object({
  token: text().min(20, "This invitation link is incomplete").max(200),
  name: text().trim().min(2, "Enter your name").max(80),
  // better-auth is configured with minPasswordLength 10 (lib/auth/server.ts).
  password: text().min(10, "Use at least 10 characters").max(128, "At most 128 characters"),
});
