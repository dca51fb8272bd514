import { Button } from "@/components/ui/button";
import { signOutAction } from "@/lib/auth/actions";

/** Signs out and goes to `next` (staff: the sign-in page; riders: the landing page). */
export function SignOutButton({ next = "/sign-in" }: { next?: "/" | "/sign-in" }) {
  return (
    <form action={signOutAction}>
      <input type="hidden" name="next" value={next} />
      <Button type="submit" variant="ghost" className="text-white hover:bg-pine-800">
        Sign out
      </Button>
    </form>
  );
}
