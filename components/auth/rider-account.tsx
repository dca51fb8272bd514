// The public pages' header corner: who is signed in (by e-mail link or password) with a way out, or
// the way in. Read on the server with the page (the pages render per request for their CSP nonce),
// so the browser loads no auth client for it.
import Link from "next/link";
import { getSessionUser } from "@/lib/auth/guard";
import { SignOutButton } from "./sign-out-button";

const link = "inline-flex min-h-11 items-center rounded-lg px-3 hover:bg-pine-800";

export async function RiderAccount() {
  const user = await getSessionUser();
  if (!user) {
    return (
      <Link href="/sign-in" className={link}>
        Sign in
      </Link>
    );
  }
  return (
    <div className="flex min-w-0 items-center gap-1">
      <span className="max-w-[10rem] truncate text-pine-100 sm:max-w-xs" title={user.email}>
        Signed in as {user.email}
      </span>
      <SignOutButton next="/" />
    </div>
  );
}
