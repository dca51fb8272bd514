"use client";

import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { authClient } from "@/lib/auth/client";

/** Signs out and goes to `next` (staff: the sign-in page; riders: the landing page). */
export function SignOutButton({ next = "/sign-in" }: { next?: string }) {
  const router = useRouter();
  return (
    <Button
      variant="ghost"
      className="text-white hover:bg-pine-800"
      onClick={async () => {
        await authClient.signOut();
        router.replace(next);
        router.refresh();
      }}
    >
      Sign out
    </Button>
  );
}
