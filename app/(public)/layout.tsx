import Link from "next/link";
import type { ReactNode } from "react";
import { RiderAccount } from "@/components/auth/rider-account";
import { Logo } from "@/components/ui/logo";

export default function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="bg-pine-900 px-4 text-white">
        <div className="mx-auto flex max-w-4xl flex-wrap items-center justify-between gap-x-4 py-2">
          <Link href="/" className="inline-flex min-h-11 items-center">
            <Logo />
          </Link>
          <nav aria-label="Main" className="flex min-w-0 items-center gap-1 text-sm">
            <Link href="/my-requests" className="inline-flex min-h-11 items-center rounded-lg px-3 hover:bg-pine-800">
              My requests
            </Link>
            <RiderAccount />
          </nav>
        </div>
      </header>
      <main className="mx-auto w-full max-w-4xl flex-1 px-4 py-8">{children}</main>
    </div>
  );
}
