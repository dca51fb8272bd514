"use client";

// Accepting an invitation: the person sets their name and password and is signed in.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { callApi, issuesByPath } from "@/components/catalog/form-utils";
import { acceptInviteSchema } from "@/lib/validations/team";

export function AcceptInviteForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [password, setPassword] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const parsed = acceptInviteSchema.safeParse({ token, name, password });
    if (!parsed.success) return setErrors(issuesByPath(parsed.error));
    setBusy(true);
    const r = await callApi("/api/invite/accept", "POST", parsed.data);
    setBusy(false);
    if (!r.ok) return (setErrors(r.fields), setFailure(r.error));
    router.replace("/shop");
    router.refresh();
  }

  return (
    <form onSubmit={submit} noValidate aria-label="Accept invitation" className="flex max-w-md flex-col gap-4">
      <p className="text-sm text-stone-700">Your account: <strong>{email}</strong></p>
      <Field id="invite-name" label="Your name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <Field id="invite-password" label="Password" type="password" autoComplete="new-password" hint="At least 10 characters" value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} />
      {failure ? <p role="alert" className="rounded-lg bg-red-50 p-3 text-sm text-red-800">{failure}</p> : null}
      <Button type="submit" disabled={busy}>{busy ? "Setting up…" : "Join the workspace"}</Button>
    </form>
  );
}
