// The one server-side guard. Route handlers reach it through the route builder (lib/api/route.ts:
// `access: [roles]`, or `access: "public"` for a handler that is public on purpose); pages call
// requireRole or requireSession with `{ page }` themselves.
import { headers as nextHeaders } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { cache } from "react";
import { getAuth } from "./server";
import { isRole, type Role } from "./roles";

export interface SessionUser {
  id: string;
  name: string;
  email: string;
  role: Role;
}

export class AuthError extends Error {
  constructor(readonly status: 401 | 403) {
    super(status === 401 ? "Sign in to continue." : "Your account may not do this.");
    this.name = "AuthError";
  }
}

async function requestHeaders(given?: Headers): Promise<Headers> {
  const headers = given ?? new Headers(await nextHeaders());
  if (!headers.get("content-type")?.startsWith("multipart/")) return headers;
  // better-auth's getSession finds no session for a multipart request's headers (it looks at the
  // content type); the session needs only the cookie, so staff uploads are recognised too.
  const copy = new Headers();
  headers.forEach((value, name) => {
    if (name !== "content-type") copy.set(name, value);
  });
  return copy;
}

async function lookUpSessionUser(given?: Headers): Promise<SessionUser | null> {
  const auth = await getAuth();
  const session = await auth.api.getSession({ headers: await requestHeaders(given) });
  if (!session) return null;
  const { id, name, email, role } = session.user as typeof session.user & { role?: string };
  return { id, name, email, role: isRole(role) ? role : "rider" };
}

// A page's layout and the page itself both guard, in the same server render: React's cache() gives
// them one session lookup per request (and none is shared between requests). Only the page-side
// call, which reads the request's own headers, is cached; a route handler passes its headers.
const currentSessionUser = cache(() => lookUpSessionUser());

/** The signed-in user, or null. Banned (deactivated) users have no session. */
export async function getSessionUser(given?: Headers): Promise<SessionUser | null> {
  return given ? lookUpSessionUser(given) : currentSessionUser();
}

interface GuardOptions {
  /** Headers of the request when called from a route handler tested outside Next. */
  headers?: Headers;
  /** For pages: where to come back after signing in. Pages redirect or show 403 instead of throwing. */
  page?: string;
}

export async function requireSession(options: GuardOptions = {}): Promise<SessionUser> {
  const user = await getSessionUser(options.headers);
  if (user) return user;
  if (options.page !== undefined) redirect(`/sign-in?next=${encodeURIComponent(options.page)}`);
  throw new AuthError(401);
}

export async function requireRole(roles: readonly Role[], options: GuardOptions = {}): Promise<SessionUser> {
  const user = await requireSession(options);
  if (roles.includes(user.role)) return user;
  if (options.page !== undefined) forbidden();
  throw new AuthError(403);
}
