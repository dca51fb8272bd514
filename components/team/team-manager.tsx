"use client";

// Team: invite by e-mail, change a role, deactivate (their sessions end at once) or reactivate.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { callApi } from "@/components/catalog/form-utils";
import { inviteSchema } from "@/lib/validations/team";

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

export function TeamManager({ members, invites, selfId }: { members: Member[]; invites: OpenInvite[]; selfId: string }) {
  const router = useRouter();
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<"tuner" | "admin">("tuner");
  const [fields, setFields] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  async function invite(e: React.FormEvent) {
    e.preventDefault();
    const parsed = inviteSchema.safeParse({ email, role });
    if (!parsed.success) return setFields({ email: parsed.error.issues[0]?.message ?? "Check the address" });
    const r = await callApi<{ email: string }>("/api/shop/team", "POST", parsed.data);
    if (!r.ok) return (setFields(r.fields), setMessage({ ok: false, text: r.error }));
    setFields({});
    setEmail("");
    setMessage({ ok: true, text: `Invitation sent to ${r.data.email}. The link works for 7 days.` });
    router.refresh();
  }
  async function change(id: string, body: { role?: string; active?: boolean }) {
    const r = await callApi(`/api/shop/team/${id}`, "PATCH", body);
    setMessage(r.ok ? { ok: true, text: "Saved." } : { ok: false, text: r.error });
    router.refresh();
  }

  return (
    <div className="flex flex-col gap-5">
      <form onSubmit={invite} noValidate aria-label="Invite to the team" className="flex flex-wrap items-end gap-3 rounded-xl border border-stone-200 bg-white p-4">
        <Field id="invite-email" label="E-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} error={fields.email} className="min-w-64" />
        <label className="flex flex-col gap-1 text-sm font-medium">
          Role
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={role} onChange={(e) => setRole(e.target.value as "tuner" | "admin")}>
            <option value="tuner">Tuner</option>
            <option value="admin">Admin</option>
          </select>
        </label>
        <Button type="submit">Send invitation</Button>
      </form>
      {message ? <p role={message.ok ? "status" : "alert"} className={`rounded-lg p-3 text-sm ${message.ok ? "bg-pine-50" : "bg-red-50 text-red-800"}`}>{message.text}</p> : null}
      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Team members</caption>
          <thead className="bg-stone-100 text-stone-700"><tr><th scope="col" className="px-3 py-2">Name</th><th scope="col" className="px-3">E-mail</th><th scope="col" className="px-3">Role</th><th scope="col" className="px-3">Status</th><th scope="col" className="px-3"><span className="sr-only">Actions</span></th></tr></thead>
          <tbody>
            {members.map((m) => (
              <tr key={m.id} className="border-t border-stone-100">
                <td className="px-3 py-2">{m.name}{m.id === selfId ? " (you)" : ""}</td>
                <td className="px-3">{m.email}</td>
                <td className="px-3">
                  <select aria-label={`Role of ${m.name}`} className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={m.role} onChange={(e) => change(m.id, { role: e.target.value })}>
                    <option value="tuner">Tuner</option>
                    <option value="admin">Admin</option>
                  </select>
                </td>
                <td className="px-3">{m.banned ? "Deactivated" : "Active"}</td>
                <td className="px-3">
                  {m.id === selfId ? null : m.banned ? (
                    <Button variant="secondary" onClick={() => change(m.id, { active: true })}>Reactivate {m.name}</Button>
                  ) : (
                    <Button variant="danger" onClick={() => change(m.id, { active: false })}>Deactivate {m.name}</Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {invites.length ? (
        <section aria-labelledby="open-invites">
          <h2 id="open-invites" className="mb-2 font-semibold">Open invitations</h2>
          <ul className="text-sm">{invites.map((i) => <li key={i.id}>{i.email} as {i.role}, until {i.expiresAt.slice(0, 10)}</li>)}</ul>
        </section>
      ) : null}
    </div>
  );
}
