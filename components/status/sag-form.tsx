"use client";

import { Form } from "@/components/ui/form";

// The sag follow-up: three readings per end in mm or inches; the engine's verdict comes back at once.
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import { ErrorText, MeasureField, UnitToggle, errorAt } from "@/components/request-form/fields";
import { Button } from "@/components/ui/button";
import type { SagVerdict } from "@/lib/sizing";
import { friendlyError } from "@/lib/validations/messages";
import { SAG_TERMS, endSagLabel } from "@/lib/validations/sag-terms";
import { sagReportSchema } from "@/lib/validations/status";
import { VerdictCard } from "./verdict-card";
import { callApi } from "@/lib/api-client";
import type { SagReportRow } from "./sag-follow-up";

const READINGS = [
  ["static", `(${SAG_TERMS.static.formula})`],
  ["race", `(${SAG_TERMS.race.formula})`],
  ["free", "(optional)"],
] as const;

export function SagForm({
  requestId,
  token,
  metric,
  onReported,
}: {
  requestId: string;
  token?: string;
  metric: boolean;
  /** The report as stored, for the list of earlier reports. */
  onReported: (report: SagReportRow) => void;
}) {
  const [result, setResult] = useState<Partial<Record<"front" | "rear", SagVerdict>> | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<FieldValues>({
    resolver: zodResolver(sagReportSchema as never, { error: friendlyError }) as never,
    defaultValues: {
      unit: metric ? "mm" : "in",
      front: { free: "", static: "", race: "" },
      rear: { free: "", static: "", race: "" },
    },
  });
  const { register, formState, setError } = form;
  const e = (path: string) => errorAt(formState.errors, path);

  const onSubmit = form.handleSubmit(async () => {
    setProblem(null);
    const raw = form.getValues();
    const sent = await callApi<SagReportRow>(
      `/api/status/${requestId}/sag`,
      "POST",
      { ...raw, token },
      {
        offline: "No connection. Your figures are still in the form: send again when you have signal.",
        fallback: "The report could not be sent.",
      },
    );
    if (sent.ok) {
      setResult(sent.data.verdict ?? {});
      onReported(sent.data);
      return;
    }
    for (const [field, message] of Object.entries(sent.fields)) setError(field, { message });
    setProblem(sent.error);
  });

  return (
    <Form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Report measured sag">
      <div className="flex items-center justify-between gap-3">
        <span className="text-sm font-medium text-stone-800">Unit for every reading</span>
        <UnitToggle name="report-unit" legend="Sag unit" units={["mm", "in"]} register={register("unit")} />
      </div>
      {(["rear", "front"] as const).map((end) => (
        <fieldset key={end} className="flex min-w-0 flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4">
          <legend className="px-1 font-semibold">{end === "rear" ? "Rear (shock)" : "Front (fork)"}</legend>
          {READINGS.map(([key, text]) => (
            <MeasureField
              key={key}
              id={`${end}-${key}`}
              label={`${endSagLabel(end, key)} ${text}`}
              register={register(`${end}.${key}`)}
              error={e(`${end}.${key}`)}
              unit={null}
            />
          ))}
        </fieldset>
      ))}
      <ErrorText id="sag-problem" message={problem ?? undefined} />
      <Button type="submit" className="min-h-12" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Checking…" : "Check my sag"}
      </Button>
      {result ? (
        <div role="status" aria-live="polite" className="flex flex-col gap-2">
          <h4 className="font-semibold">What the numbers say</h4>
          {(["rear", "front"] as const).map((end) =>
            result[end] ? <VerdictCard key={end} verdict={result[end]} /> : null,
          )}
        </div>
      ) : null}
    </Form>
  );
}
