// The better-auth instance: staff sign in with e-mail and password, riders with an e-mail link.
// Created lazily (it needs the database) and kept on globalThis like the database handle.
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, magicLink } from "better-auth/plugins";
import { getDb, type AppDb } from "@/db/client";
import * as schema from "@/db/schema";
import { CLIENT_HEADER } from "@/lib/api/client-address";
import { appBaseUrl } from "@/lib/env";
import { authRoles, accessControl } from "./roles";
import { resolveAuthSecret } from "./secret";
import { MAGIC_LINK_MINUTES, sendSignInLink } from "./sign-in-mail";

function createAuth(db: AppDb) {
  const baseURL = appBaseUrl();
  return betterAuth({
    appName: "Sagwise",
    baseURL,
    secret: resolveAuthSecret(),
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      // Staff accounts come from the seed or an admin's invitation, never from open sign-up.
      disableSignUp: true,
      minPasswordLength: 10,
    },
    advanced: {
      // The auth route writes the address lib/api/client-address.ts decided on (socket or trusted
      // proxy hop) into CLIENT_HEADER, replacing any client value; X-Forwarded-For is not read.
      ipAddress: { ipAddressHeaders: [CLIENT_HEADER], ipv6Subnet: 64 },
      // Session cookies: never readable by scripts, not sent on cross-site subrequests, and Secure
      // whenever the app is served over https (BETTER_AUTH_URL).
      useSecureCookies: baseURL.startsWith("https://"),
      defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
    },
    session: { expiresIn: 60 * 60 * 24 * 7, updateAge: 60 * 60 * 24 },
    plugins: [
      admin({ defaultRole: "rider", adminRoles: ["admin"], ac: accessControl, roles: authRoles }),
      magicLink({
        expiresIn: MAGIC_LINK_MINUTES * 60,
        storeToken: "hashed",
        sendMagicLink: ({ email, url }) => sendSignInLink({ email, url }),
      }),
      nextCookies(),
    ],
  });
}

export type Auth = ReturnType<typeof createAuth>;

const holder = globalThis as unknown as { __sagwiseAuth?: Promise<Auth> };

export function getAuth(): Promise<Auth> {
  if (!holder.__sagwiseAuth) {
    holder.__sagwiseAuth = getDb()
      .then(createAuth)
      .catch((error: unknown) => {
        holder.__sagwiseAuth = undefined;
        throw error;
      });
  }
  return holder.__sagwiseAuth;
}

/** Tests that swap the database also drop the auth instance bound to the old one. */
export function resetAuthForTests(): void {
  holder.__sagwiseAuth = undefined;
}
