"use server";
// Server actions of the auth layer. Signing out is a plain form post (it works before the page's
// scripts have loaded, and the public pages need no auth client in the browser).
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { getAuth } from "./server";

/** Where a sign-out may land: riders on the landing page, staff on the sign-in page. */
const AFTER_SIGN_OUT = new Set(["/", "/sign-in"]);

export async function signOutAction(form: FormData): Promise<void> {
  const next = String(form.get("next") ?? "");
  const auth = await getAuth();
  // Without a session there is nothing to end; either way the visitor lands signed out.
  await auth.api.signOut({ headers: await headers() }).catch(() => undefined);
  redirect(AFTER_SIGN_OUT.has(next) ? next : "/sign-in");
}
