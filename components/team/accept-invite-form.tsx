"use client";

import { Form } from "@/components/ui/form";

// Accepting an invitation: the person sets their name and password and is signed in.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { applyServerErrors } from "@/components/forms/apply-server-errors";
import { callApi } from "@/lib/api-client";
import { acceptInviteSchema } from "@/lib/validations/team";

type Schema = typeof acceptInviteSchema;

export function AcceptInviteForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(acceptInviteSchema),
    defaultValues: { token, name: "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const r = await callApi("/api/invite/accept", "POST", values);
    if (!r.ok) {
      const other = applyServerErrors(setError, r.fields, { fields: ["name", "password"] });
      return setFailure([r.error, ...other].join(" "));
    }
    router.replace("/shop");
    router.refresh();
  });
  // The token is not an input: a broken link is said at the form level.
  const tokenError = formState.errors.token?.message;

  return (
    <Form onSubmit={onSubmit} noValidate aria-label="Accept invitation" className="flex max-w-md flex-col gap-4">
      <p className="text-sm text-stone-700">
        Your account: <strong>{email}</strong>
      </p>
      <Field
        id="invite-name"
        label="Your name"
        autoComplete="name"
        error={formState.errors.name?.message}
        {...register("name")}
      />
      <Field
        id="invite-password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <FormAlert message={failure ?? tokenError} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Setting up…" : "Join the workspace"}
      </Button>
    </Form>
  );
}
