"use client";

// Team: invite by e-mail, change a role, deactivate (their sessions end at once) or reactivate.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";
import { formatDay } from "@/lib/format";
import { roleLabel } from "@/lib/labels";
import { InviteForm, type InviteMessage } from "./invite-form";
import { ScrollBox } from "@/components/ui/scroll-box";

export interface Member {
  id: string;
  name: string;
  email: string;
  role: string;
  banned: boolean | null;
}
export interface OpenInvite {
  id: string;
  email: string;
  role: string;
  expiresAt: string;
}

export function TeamManager({
  members,
  invites,
  selfId,
}: {
  members: Member[];
  invites: OpenInvite[];
  selfId: string;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<InviteMessage | null>(null);

  async function invite(i: OpenInvite, method: "POST" | "DELETE") {
    const r = await callApi(`/api/shop/team/invites/${i.id}`, method);
    setMessage(
      r.ok
        ? {
            ok: true,
            text:
              method === "POST"
                ? `Invitation sent again to ${i.email} with a new link (valid 7 days); the earlier link no longer works.`
                : `Invitation to ${i.email} revoked: its link no longer works.`,
          }
        : { ok: false, text: r.error },
    );
    router.refresh();
  }

  async function change(id: string, body: { role?: string; active?: boolean }) {
    const r = await callApi(`/api/shop/team/${id}`, "PATCH", body);
    setMessage(r.ok ? { ok: true, text: "Saved." } : { ok: false, text: r.error });
    router.refresh();
  }

  return (
    <div className="flex flex-col gap-5">
      <InviteForm
        onResult={(m) => {
          setMessage(m);
          if (m.ok) router.refresh();
        }}
      />
      {message ? (
        <p
          role={message.ok ? "status" : "alert"}
          className={`rounded-lg p-3 text-sm ${message.ok ? "bg-pine-50" : "bg-red-50 text-red-800"}`}
        >
          {message.text}
        </p>
      ) : null}
      <ScrollBox label="Team members" className="rounded-xl border border-stone-200 bg-white">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Team members</caption>
          <thead className="bg-stone-100 text-stone-700">
            <tr>
              <th scope="col" className="px-3 py-2">
                Name
              </th>
              <th scope="col" className="px-3">
                E-mail
              </th>
              <th scope="col" className="px-3">
                Role
              </th>
              <th scope="col" className="px-3">
                Status
              </th>
              <th scope="col" className="px-3">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.id} className="border-t border-stone-100">
                <td className="px-3 py-2">
                  {m.name}
                  {m.id === selfId ? " (you)" : ""}
                </td>
                <td className="px-3">{m.email}</td>
                <td className="px-3">
                  <select
                    aria-label={`Role of ${m.name}`}
                    className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
                    value={m.role}
                    onChange={(e) => change(m.id, { role: e.target.value })}
                  >
                    <option value="tuner">Tuner</option>
                    <option value="admin">Admin</option>
                  </select>
                </td>
                <td className="px-3">{m.banned ? "Deactivated" : "Active"}</td>
                <td className="px-3">
                  {m.id === selfId ? null : m.banned ? (
                    <Button variant="secondary" onClick={() => change(m.id, { active: true })}>
                      Reactivate {m.name}
                    </Button>
                  ) : (
                    <Button variant="danger" onClick={() => change(m.id, { active: false })}>
                      Deactivate {m.name}
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      {invites.length ? (
        <section aria-labelledby="open-invites">
          <h2 id="open-invites" className="mb-2 font-semibold">
            Open invitations
          </h2>
          <ul className="flex flex-col gap-2 text-sm">
            {invites.map((i) => (
              <li
                key={i.id}
                className="flex flex-wrap items-center gap-2 rounded-lg border border-stone-200 bg-white p-2"
              >
                <span className="min-w-0 flex-1 break-all">
                  {i.email} as {roleLabel(i.role).toLowerCase()}, link valid until {formatDay(i.expiresAt)}
                </span>
                <Button
                  variant="secondary"
                  onClick={() => invite(i, "POST")}
                  aria-label={`Resend the invitation to ${i.email}`}
                >
                  Resend
                </Button>
                <Button
                  variant="danger"
                  onClick={() => invite(i, "DELETE")}
                  aria-label={`Revoke the invitation to ${i.email}`}
                >
                  Revoke
                </Button>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
