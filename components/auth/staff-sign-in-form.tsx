"use client";

import { Form } from "@/components/ui/form";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { authClient } from "@/lib/auth/client";
import { staffSignInSchema } from "@/lib/validations/auth";

type Input = z.input<typeof staffSignInSchema>;
type Output = z.output<typeof staffSignInSchema>;

export function StaffSignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Input, unknown, Output>({
    resolver: zodResolver(staffSignInSchema),
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const { error } = await authClient.signIn.email({ email: values.email, password: values.password });
    if (error) {
      setFailure(
        error.status === 403
          ? "This account is deactivated. Ask the shop owner."
          : error.status === 429
            ? "Too many sign-in attempts. Wait a few seconds and try again."
            : "That e-mail and password do not match a staff account.",
      );
      return;
    }
    router.replace(next);
    router.refresh();
  });

  return (
    <Form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Staff sign-in">
      <Field
        id="staff-email"
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <Field
        id="staff-password"
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register("password")}
      />
      <FormAlert message={failure} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </Form>
  );
}
