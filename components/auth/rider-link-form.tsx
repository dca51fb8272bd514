"use client";

import { Form } from "@/components/ui/form";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import { authClient } from "@/lib/auth/client";
import { riderLinkSchema } from "@/lib/validations/auth";

type Input = z.input<typeof riderLinkSchema>;
type Output = z.output<typeof riderLinkSchema>;

export function RiderLinkForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Input, unknown, Output>({
    resolver: zodResolver(riderLinkSchema),
  });

  const onSubmit = handleSubmit(async ({ email }) => {
    setFailure(null);
    const { error } = await authClient.signIn.magicLink({ email, callbackURL: "/my-requests" });
    if (error) {
      setFailure(
        error.status === 429
          ? "Too many links asked for. Wait a minute and try again."
          : "We could not send the link just now. Try again in a moment.",
      );
      return;
    }
    setSentTo(email);
  });

  if (sentTo) {
    return (
      <p role="status" className="rounded-lg bg-pine-50 p-4 text-pine-900">
        A sign-in link is on its way to <strong>{sentTo}</strong>. It works once and for 15 minutes.
      </p>
    );
  }

  return (
    <Form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Rider sign-in">
      <Field
        id="rider-email"
        label="E-mail you used for your request"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={formState.errors.email?.message}
        {...register("email")}
      />
      <FormAlert message={failure} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Sending…" : "E-mail me a sign-in link"}
      </Button>
    </Form>
  );
}
