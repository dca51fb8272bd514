"use client";

// One react-hook-form per step, validated by that step's shared schema; every change is handed to
// the draft so nothing typed is lost.
import { useEffect } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import type { z } from "zod";
import { stepResolver } from "./prepare";

export interface StepProps {
  values: Record<string, unknown>;
  onChange: (values: Record<string, unknown>) => void;
  onNext: (values: Record<string, unknown>) => void;
  onBack?: () => void;
  metric: boolean;
}

export function useStepForm(step: string, schema: z.ZodType, defaults: Record<string, unknown>, props: StepProps) {
  const form = useForm<FieldValues>({
    resolver: stepResolver(step, schema),
    defaultValues: { ...defaults, ...props.values },
    mode: "onTouched",
  });
  const { subscribe } = form;
  const { onChange } = props;
  useEffect(
    () =>
      subscribe({ formState: { values: true }, callback: ({ values }) => onChange(values as Record<string, unknown>) }),
    [subscribe, onChange],
  );
  // Validated by the schema; the draft keeps the raw values (strings, empty fields), which is what
  // the form needs to show them again.
  const submit = form.handleSubmit(() => props.onNext(form.getValues()));
  return { form, submit };
}
