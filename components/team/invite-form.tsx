"use client";

import { Form } from "@/components/ui/form";

// Invite by e-mail with a role; the result (sent or refused) is said by the team page.
import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { applyServerErrors } from "@/components/forms/apply-server-errors";
import { callApi } from "@/lib/api-client";
import { inviteSchema } from "@/lib/validations/team";

type Schema = typeof inviteSchema;
export type InviteMessage = { ok: boolean; text: string };

export function InviteForm({ onResult }: { onResult: (message: InviteMessage) => void }) {
  const { register, handleSubmit, setError, resetField, formState } = useForm<
    z.input<Schema>,
    unknown,
    z.output<Schema>
  >({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", role: "tuner" },
  });

  const onSubmit = handleSubmit(async (values) => {
    const r = await callApi<{ email: string }>("/api/shop/team", "POST", values);
    if (!r.ok) {
      const other = applyServerErrors(setError, r.fields, { fields: ["email", "role"] });
      return onResult({ ok: false, text: [r.error, ...other].join(" ") });
    }
    resetField("email");
    onResult({ ok: true, text: `Invitation sent to ${r.data.email}. The link works for 7 days.` });
  });

  return (
    <Form
      onSubmit={onSubmit}
      noValidate
      aria-label="Invite to the team"
      className="flex flex-wrap items-end gap-3 rounded-xl border border-stone-200 bg-white p-4"
    >
      <Field
        id="invite-email"
        label="E-mail"
        type="email"
        error={formState.errors.email?.message}
        className="min-w-64"
        {...register("email")}
      />
      <label className="flex flex-col gap-1 text-sm font-medium">
        Role
        <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" {...register("role")}>
          <option value="tuner">Tuner</option>
          <option value="admin">Admin</option>
        </select>
        {formState.errors.role ? <span className="text-red-700">{formState.errors.role.message}</span> : null}
      </label>
      <Button type="submit" disabled={formState.isSubmitting}>
        Send invitation
      </Button>
    </Form>
  );
}
