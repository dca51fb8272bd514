// Three roles: riders send requests and follow them; staff (tuners and admins) work the shop
// workspace; admins also manage the team and the shop's settings.
import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements, userAc } from "better-auth/plugins/admin/access";

export const ROLES = ["admin", "tuner", "rider"] as const;
export type Role = (typeof ROLES)[number];
export const STAFF_ROLES = ["admin", "tuner"] as const satisfies readonly Role[];

export function isStaff(role: Role): boolean {
  return (STAFF_ROLES as readonly Role[]).includes(role);
}

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
