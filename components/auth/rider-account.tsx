"use client";

// The public pages' header corner: who is signed in (by e-mail link or password) with a way out, or
// the way in. Read in the browser so the public pages stay static.
import Link from "next/link";
import { authClient } from "@/lib/auth/client";
import { SignOutButton } from "./sign-out-button";

const link = "inline-flex min-h-11 items-center rounded-lg px-3 hover:bg-pine-800";

export function RiderAccount() {
  const { data, isPending } = authClient.useSession();
  if (isPending) return <span className="min-h-11 w-16" aria-hidden="true" />;
  if (!data?.user) {
    return (
      <Link href="/sign-in" className={link}>
        Sign in
      </Link>
    );
  }
  return (
    <div className="flex min-w-0 items-center gap-1">
      <span className="max-w-[10rem] truncate text-pine-100 sm:max-w-xs" title={data.user.email}>
        Signed in as {data.user.email}
      </span>
      <SignOutButton next="/" />
    </div>
  );
}
