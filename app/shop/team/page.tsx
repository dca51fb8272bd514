import type { Metadata } from "next";
import { TeamManager } from "@/components/team/team-manager";
import { listOpenInvites } from "@/db/queries/invites";
import { listStaff } from "@/db/queries/team";
import { requireRole } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Team" };
export const dynamic = "force-dynamic";

export default async function TeamPage() {
  const admin = await requireRole(["admin"], { page: "/shop/team" });
  const [members, invites] = await Promise.all([listStaff(), listOpenInvites()]);
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Team</h1>
      <p className="max-w-3xl text-sm text-stone-700">
        Invite tuners and admins by e-mail. Deactivating someone signs them out everywhere at once. The shop always
        keeps at least one active admin.
      </p>
      <TeamManager
        members={members}
        invites={invites.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString() }))}
        selfId={admin.id}
      />
    </div>
  );
}
