// The three roles of product.md. Staff roles reach the shop workspace; admin also team and settings.
import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements, userAc } from "better-auth/plugins/admin/access";

export const ROLES = ["admin", "tuner", "rider"] as const;
export type Role = (typeof ROLES)[number];
export const STAFF_ROLES = ["admin", "tuner"] as const satisfies readonly Role[];

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

// better-auth's admin plugin checks its own user-management permissions against these; only the
// admin role may list, create, ban or re-role users.
export const accessControl = createAccessControl(defaultStatements);
export const authRoles = {
  admin: adminAc,
  tuner: accessControl.newRole({ user: [], session: [] }),
  rider: userAc,
};
