"use client";

import { Form } from "@/components/ui/form";

import { feelStepSchema } from "@/lib/validations/request";
import { SAG_TERMS, endSagLabel } from "@/lib/validations/sag-terms";
import { ChoiceGroup, MeasureField, TextAreaField, UnitToggle, errorAt } from "./fields";
import { COMPLAINT_LABELS } from "./labels";
import { StepActions } from "./step-actions";
import { useStepForm, type StepProps } from "./use-step-form";

const SAG_FIELDS = [
  ["rearStatic", `${endSagLabel("rear", "static")} (${SAG_TERMS.static.meaning})`],
  ["rearRace", `${endSagLabel("rear", "race")} (${SAG_TERMS.race.meaning})`],
  ["forkStatic", `${endSagLabel("front", "static")} (fork)`],
  ["forkRace", `${endSagLabel("front", "race")} (fork)`],
] as const;

export function FeelStep(props: StepProps) {
  const { form, submit } = useStepForm(
    "feel",
    feelStepSchema,
    {
      complaints: [],
      notes: "",
      currentSag: { unit: props.metric ? "mm" : "in", rearStatic: "", rearRace: "", forkStatic: "", forkRace: "" },
    },
    props,
  );
  const { register, formState } = form;
  const e = (path: string) => errorAt(formState.errors, path);
  return (
    <Form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="How it feels">
      <ChoiceGroup
        name="complaints"
        legend="What feels wrong? (tick all that apply)"
        type="checkbox"
        options={COMPLAINT_LABELS}
        register={register("complaints")}
        error={e("complaints")}
      />
      <TextAreaField
        id="feel-notes"
        label="Tell us more (optional)"
        hint="Where and when it happens: a section of track, a kind of bump."
        register={register("notes")}
        error={e("notes")}
      />
      <fieldset className="flex min-w-0 flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4">
        <legend className="px-1 text-sm font-medium text-stone-800">Sag you measured (optional)</legend>
        <div className="flex items-center justify-between gap-3">
          <span className="text-sm text-stone-700">Unit for all four</span>
          <UnitToggle name="sag-unit" legend="Sag unit" units={["mm", "in"]} register={register("currentSag.unit")} />
        </div>
        {SAG_FIELDS.map(([key, text]) => (
          <MeasureField
            key={key}
            id={`sag-${key}`}
            label={text}
            register={register(`currentSag.${key}`)}
            error={e(`currentSag.${key}`)}
            unit={null}
          />
        ))}
      </fieldset>
      <StepActions onBack={props.onBack} nextLabel="Review" />
    </Form>
  );
}
