"use client";

import { Form } from "@/components/ui/form";

import { ridingStepSchema } from "@/lib/validations/request";
import { ChoiceGroup, MeasureField, errorAt } from "./fields";
import { DISCIPLINE_LABELS, JUMP_LABELS, TERRAIN_LABELS } from "./labels";
import { StepActions } from "./step-actions";
import { useStepForm, type StepProps } from "./use-step-form";

export function RidingStep(props: StepProps) {
  const { form, submit } = useStepForm(
    "riding",
    ridingStepSchema,
    { discipline: "", terrain: [], jumpSize: "", hoursPerMonth: "" },
    props,
  );
  const { register, formState } = form;
  const e = (path: string) => errorAt(formState.errors, path);
  return (
    <Form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="Your riding">
      <ChoiceGroup
        name="discipline"
        legend="What do you ride most?"
        type="radio"
        options={DISCIPLINE_LABELS}
        register={register("discipline")}
        error={e("discipline")}
      />
      <ChoiceGroup
        name="terrain"
        legend="Ground you ride on (tick all that apply)"
        type="checkbox"
        options={TERRAIN_LABELS}
        register={register("terrain")}
        error={e("terrain")}
      />
      <ChoiceGroup
        name="jumpSize"
        legend="Typical jumps"
        type="radio"
        options={JUMP_LABELS}
        register={register("jumpSize")}
        error={e("jumpSize")}
        columns={1}
      />
      <MeasureField
        id="riding-hours"
        label="Hours ridden per month (optional)"
        inputMode="numeric"
        register={register("hoursPerMonth")}
        error={e("hoursPerMonth")}
        unit={<span className="flex items-center px-2 text-stone-700">h</span>}
      />
      <StepActions onBack={props.onBack} />
    </Form>
  );
}
