"use client";

import { Form } from "@/components/ui/form";

import { AnswersList } from "@/components/status/answers-list";
import { Button } from "@/components/ui/button";
import { reviewStepSchema } from "@/lib/validations/request";
import { ErrorText, errorAt } from "./fields";
import type { Draft } from "./draft";
import { prepareStep } from "./prepare";
import { STEP_TITLES } from "./step-indicator";
import { useStepForm, type StepProps } from "./use-step-form";

const STEP_OF: Record<string, number> = { rider: 0, riding: 1, bike: 2, photos: 2, feel: 3, review: 4 };

export interface ServerProblem {
  error: string;
  fields?: Record<string, string>;
}

interface ReviewStepProps extends StepProps {
  draft: Draft;
  photos: File[];
  submitting: boolean;
  problem: ServerProblem | null;
  onGo: (step: number) => void;
}

export function ReviewStep({ draft, photos, submitting, problem, onGo, ...props }: ReviewStepProps) {
  const { form, submit } = useStepForm("review", reviewStepSchema, { consent: false }, props);
  const e = (path: string) => errorAt(form.formState.errors, path);
  const answers = Object.fromEntries(
    ["rider", "riding", "bike", "feel"].map((k) => [k, prepareStep(k, draft.values[k as "rider"])]),
  );
  const bikeName = (draft.values.bike?.bikeName as string) || null;
  const edit = (section: "rider" | "riding" | "bike" | "feel") => (
    <Button variant="ghost" onClick={() => onGo(STEP_OF[section]!)}>
      Edit<span className="sr-only"> {section}</span>
    </Button>
  );
  return (
    <Form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="Review and send">
      {problem ? (
        <div role="alert" className="rounded-xl border border-red-300 bg-red-50 p-4 text-red-900">
          <p className="font-semibold">{problem.error}</p>
          {problem.fields ? (
            <ul className="mt-2 flex flex-col gap-2">
              {Object.entries(problem.fields).map(([field, message]) => {
                const step = STEP_OF[field.split(".")[0] ?? ""];
                return (
                  <li key={field} className="flex flex-wrap items-center justify-between gap-2">
                    <span>{message}</span>
                    {step !== undefined && step < 4 ? (
                      <Button variant="secondary" onClick={() => onGo(step)}>
                        Fix in “{STEP_TITLES[step]}”
                      </Button>
                    ) : null}
                  </li>
                );
              })}
            </ul>
          ) : null}
        </div>
      ) : null}
      <AnswersList answers={answers} bikeLabel={bikeName} edit={edit} />
      <section className="rounded-xl border border-stone-200 bg-white p-4">
        <h3 className="text-lg font-semibold">Photos</h3>
        <p className="mt-1">
          {photos.length
            ? `${photos.length} photo${photos.length > 1 ? "s" : ""}: ${photos.map((p) => p.name).join(", ")}`
            : "No photos added."}
        </p>
      </section>
      <div className="flex flex-col gap-1">
        <label className="flex min-h-12 items-start gap-3 rounded-lg border border-stone-300 bg-white p-3">
          <input
            type="checkbox"
            className="mt-0.5 h-5 w-5 shrink-0 accent-pine-700"
            aria-describedby={e("consent") ? "consent-error" : undefined}
            {...form.register("consent")}
          />
          <span>The shop may contact me by e-mail (and phone, if given) about this request.</span>
        </label>
        <ErrorText id="consent-error" message={e("consent")} />
      </div>
      <div className="sticky bottom-0 -mx-4 flex gap-3 border-t border-stone-200 bg-stone-50/95 px-4 py-3">
        <Button variant="secondary" className="min-h-12 flex-1" onClick={props.onBack}>
          Back
        </Button>
        <Button type="submit" className="min-h-12 flex-[2]" disabled={submitting}>
          {submitting ? "Sending…" : "Send my request"}
        </Button>
      </div>
    </Form>
  );
}
