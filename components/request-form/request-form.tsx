"use client";

// The rider's setup request, one step at a time. Every change goes to the draft in localStorage;
// the request is sent once from the review step and the draft is cleared only after a 201.
import { useRouter } from "next/navigation";
import { startTransition, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { Providers } from "@/components/providers";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";
import { BikeStep } from "./bike-step";
import { clearDraft, emptyDraft, loadDraft, saveDraft, STEP_KEYS, type Draft, type StepKey } from "./draft";
import { FeelStep } from "./feel-step";
import { prepareStep } from "./prepare";
import { ReviewStep, type ServerProblem } from "./review-step";
import { RiderStep } from "./rider-step";
import { RidingStep } from "./riding-step";
import { STEP_TITLES, StepIndicator } from "./step-indicator";

const HEADINGS = ["About you", "Your riding", "Your bike", "How it feels", "Check and send"];

const OFFLINE = "No connection: your answers are kept on this phone. Check your signal and press send again.";

function send(draft: Draft, photos: File[]) {
  const answers = {
    ...Object.fromEntries(STEP_KEYS.slice(0, 4).map((k) => [k, prepareStep(k, draft.values[k])])),
    review: { consent: draft.values.review?.consent === true },
  };
  if (!photos.length) return callApi<{ statusUrl: string }>("/api/requests", "POST", answers, { offline: OFFLINE });
  const body = new FormData();
  body.set("answers", JSON.stringify(answers));
  for (const photo of photos) body.append("photos", photo);
  return callApi<{ statusUrl: string }>("/api/requests", "POST", body, { offline: OFFLINE });
}

/** `prefill.bike`: the catalog bike a link chose (/request?bike=<id>, e.g. from a service reminder). */
export function RequestForm({
  metric,
  prefill,
}: {
  metric: boolean;
  prefill?: { bike?: { id: string; name: string } };
}) {
  const router = useRouter();
  const [draft, setDraft] = useState<Draft | null>(null);
  const [restored, setRestored] = useState(false);
  // Photos picked before the reload: the draft keeps only their number, so the rider is asked to add
  // them again only when there were some.
  const [lostPhotos, setLostPhotos] = useState(0);
  const [photos, setPhotos] = useState<File[]>([]);
  const [submitting, setSubmitting] = useState(false);
  const [problem, setProblem] = useState<ServerProblem | null>(null);
  // Bumped by "start over" so every step's form starts again from empty.
  const [generation, setGeneration] = useState(0);
  const heading = useRef<HTMLHeadingElement>(null);
  const shownStep = useRef<number | null>(null);

  const [prefillId, prefillName] = [prefill?.bike?.id, prefill?.bike?.name];
  useEffect(() => {
    const found = loadDraft();
    const start = found ?? emptyDraft();
    if (prefillId) start.values.bike = { ...start.values.bike, modelId: prefillId, bikeName: prefillName ?? "" };
    // Reading localStorage can only happen in the browser, after the first render. Mounting the
    // step is a transition, so React renders it in slices and the page stays responsive meanwhile.
    startTransition(() => {
      setDraft(start);
      setRestored(Boolean(found && Object.keys(found.values).length));
      setLostPhotos(found?.photoCount ?? 0);
    });
  }, [prefillId, prefillName]);

  // Moving between steps puts the focus on the new step's heading (not on first load).
  const step = draft?.step;
  useEffect(() => {
    if (step === undefined) return;
    if (shownStep.current !== null && shownStep.current !== step) {
      window.scrollTo({ top: 0 });
      heading.current?.focus();
    }
    shownStep.current = step;
  }, [step]);

  // The draft is saved with every change; saving twice (strict mode) is harmless.
  const update = useCallback((change: (d: Draft) => Draft) => {
    setDraft((d) => {
      const next = change(d ?? emptyDraft());
      saveDraft(next);
      return next;
    });
  }, []);

  const go = useCallback(
    (to: number) => update((d) => ({ ...d, step: to, reached: Math.max(d.reached, to) })),
    [update],
  );

  // Stable handlers per step, so each step's watch subscription is set up once.
  const handlers = useMemo(
    () =>
      Object.fromEntries(
        STEP_KEYS.map((key) => [
          key,
          (values: Record<string, unknown>) => update((d) => ({ ...d, values: { ...d.values, [key]: values } })),
        ]),
      ) as Record<StepKey, (values: Record<string, unknown>) => void>,
    [update],
  );

  const choosePhotos = (files: File[]) => {
    setPhotos(files);
    update((d) => ({ ...d, photoCount: files.length }));
  };

  if (!draft) {
    return (
      <p className="text-stone-700" aria-busy="true">
        Opening the form…
      </p>
    );
  }

  const submit = async (values: Record<string, unknown>) => {
    const current = { ...draft, values: { ...draft.values, review: values } };
    setSubmitting(true);
    setProblem(null);
    try {
      const result = await send(current, photos);
      if (result.ok) {
        clearDraft();
        router.push(`${result.data.statusUrl}?sent=1`);
        return;
      }
      // A refusal may name fields (each with a way back to its step); 429 or no connection only say what to do.
      setProblem({ error: result.error, ...(Object.keys(result.fields).length ? { fields: result.fields } : {}) });
    } finally {
      setSubmitting(false);
    }
  };

  const common = (key: StepKey) => ({
    values: draft.values[key] ?? {},
    onChange: handlers[key],
    onNext: () => go(Math.min(draft.step + 1, 4)),
    onBack: draft.step > 0 ? () => go(draft.step - 1) : undefined,
    metric,
  });
  const photoError = problem?.fields
    ? Object.entries(problem.fields).find(([k]) => k.startsWith("photos"))?.[1]
    : undefined;

  return (
    <Providers>
      <div className="flex flex-col gap-5">
        <StepIndicator step={draft.step} reached={draft.reached} onGo={go} />
        {restored ? (
          <div
            role="status"
            className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-pine-50 p-3 text-pine-900"
          >
            <span>
              We kept your answers from last time
              {lostPhotos > 0 && photos.length === 0
                ? ` (the ${lostPhotos === 1 ? "photo has" : `${lostPhotos} photos have`} to be added again)`
                : ""}
              .
            </span>
            <Button
              variant="ghost"
              onClick={() => {
                clearDraft();
                setDraft(emptyDraft());
                setGeneration((g) => g + 1);
                setRestored(false);
                setPhotos([]);
                setLostPhotos(0);
              }}
            >
              Start over
            </Button>
          </div>
        ) : null}
        <h2 ref={heading} tabIndex={-1} className="text-xl font-bold outline-none">
          Step {draft.step + 1} of 5: {HEADINGS[draft.step]}
          <span className="sr-only"> ({STEP_TITLES[draft.step]})</span>
        </h2>
        {draft.step === 0 ? <RiderStep key={`rider-${generation}`} {...common("rider")} /> : null}
        {draft.step === 1 ? <RidingStep key={`riding-${generation}`} {...common("riding")} /> : null}
        {draft.step === 2 ? (
          <BikeStep
            key={`bike-${generation}`}
            {...common("bike")}
            photos={photos}
            onPhotos={choosePhotos}
            photoError={photoError}
          />
        ) : null}
        {draft.step === 3 ? <FeelStep key={`feel-${generation}`} {...common("feel")} /> : null}
        {draft.step === 4 ? (
          <ReviewStep
            key={`review-${generation}`}
            {...common("review")}
            onNext={submit}
            draft={draft}
            photos={photos}
            submitting={submitting}
            problem={problem}
            onGo={go}
          />
        ) : null}
      </div>
    </Providers>
  );
}
