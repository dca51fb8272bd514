import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AcceptInviteForm } from "@/components/team/accept-invite-form";
import { openInvite } from "@/lib/auth/staff";
import { ConflictError, NotFoundError } from "@/lib/errors";

export const metadata: Metadata = { title: "Join the workspace", robots: { index: false } };
export const dynamic = "force-dynamic";

// Public on purpose: the invitee has no account yet; the e-mailed token is the proof.
export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let invite: Awaited<ReturnType<typeof openInvite>>;
  try {
    invite = await openInvite(token);
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    if (error instanceof ConflictError)
      return (
        <div className="flex flex-col gap-3">
          <h1 className="text-2xl font-bold">This invitation cannot be used</h1>
          <p>{error.message}</p>
          <Link href="/sign-in" className="inline-flex min-h-11 items-center text-pine-700 underline">
            Go to sign-in
          </Link>
        </div>
      );
    throw error;
  }
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Join the workspace as {invite.role === "admin" ? "an admin" : "a tuner"}</h1>
      <AcceptInviteForm token={token} email={invite.email} />
    </div>
  );
}
