"use client";

import { Form } from "@/components/ui/form";

// The rider's answer to the tuner's question; the request goes back to the tuner at once.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { TextAreaField } from "@/components/request-form/fields";
import { Button } from "@/components/ui/button";
import { riderAnswerSchema } from "@/lib/validations/status";
import { callApi } from "@/lib/api-client";

type Input = z.input<typeof riderAnswerSchema>;

export function AnswerForm({ requestId, token }: { requestId: string; token?: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<Input>({
    resolver: zodResolver(riderAnswerSchema),
    defaultValues: { token, body: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    setProblem(null);
    const sent = await callApi(
      `/api/status/${requestId}/answer`,
      "POST",
      { ...values, token },
      {
        offline: "No connection. Your answer is still in the box: send again when you have signal.",
        fallback: "The answer could not be sent.",
      },
    );
    if (sent.ok) {
      router.refresh();
      return;
    }
    if (sent.fields.body) setError("body", { message: sent.fields.body });
    setProblem(sent.error);
  });
  return (
    <Form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label="Answer the shop">
      <TextAreaField
        id="answer-body"
        label="Your answer"
        register={register("body")}
        error={formState.errors.body?.message}
      />
      {problem ? (
        <p role="alert" className="text-sm font-medium text-red-700">
          {problem}
        </p>
      ) : null}
      <Button type="submit" className="min-h-12" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Sending…" : "Send answer"}
      </Button>
    </Form>
  );
}
