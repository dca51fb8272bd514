"use client";

import { Form } from "@/components/ui/form";

import { Field } from "@/components/ui/field";
import { riderStepSchema } from "@/lib/validations/request";
import { ChoiceGroup, MeasureField, UnitToggle, errorAt } from "./fields";
import { SKILL_LABELS, STYLE_LABELS } from "./labels";
import { StepActions } from "./step-actions";
import { useStepForm, type StepProps } from "./use-step-form";

export function RiderStep(props: StepProps) {
  const { form, submit } = useStepForm(
    "rider",
    riderStepSchema,
    {
      name: "",
      email: "",
      phone: "",
      weight: { value: "", unit: props.metric ? "kg" : "lb" },
      gearIncluded: false,
      height: { value: "", unit: props.metric ? "cm" : "in" },
      skill: "",
      style: "",
    },
    props,
  );
  const { register, formState } = form;
  const e = (path: string) => errorAt(formState.errors, path);
  return (
    <Form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="About you">
      <Field id="rider-name" label="Your name" autoComplete="name" error={e("name")} {...register("name")} />
      <Field
        id="rider-email"
        label="E-mail"
        type="email"
        inputMode="email"
        autoComplete="email"
        hint="Your private status link and the setup sheet go here."
        error={e("email")}
        {...register("email")}
      />
      <Field
        id="rider-phone"
        label="Phone (optional)"
        type="tel"
        inputMode="tel"
        autoComplete="tel"
        error={e("phone")}
        {...register("phone")}
      />
      <MeasureField
        id="rider-weight"
        label="Your weight"
        register={register("weight.value")}
        error={e("weight.value") ?? e("weight") ?? e("weight.unit")}
        unit={
          <UnitToggle name="weight-unit" legend="Weight unit" units={["kg", "lb"]} register={register("weight.unit")} />
        }
      />
      <label className="flex min-h-12 items-center gap-3 rounded-lg border border-stone-300 bg-white px-3">
        <input type="checkbox" className="h-5 w-5 accent-pine-700" {...register("gearIncluded")} />
        <span>That weight includes my riding gear</span>
      </label>
      <MeasureField
        id="rider-height"
        label="Height (optional)"
        register={register("height.value")}
        error={e("height.value")}
        unit={
          <UnitToggle name="height-unit" legend="Height unit" units={["cm", "in"]} register={register("height.unit")} />
        }
      />
      <ChoiceGroup
        name="skill"
        legend="Skill level"
        type="radio"
        options={SKILL_LABELS}
        register={register("skill")}
        error={e("skill")}
      />
      <ChoiceGroup
        name="style"
        legend="Riding style"
        type="radio"
        options={STYLE_LABELS}
        register={register("style")}
        error={e("style")}
        columns={1}
      />
      <StepActions onBack={props.onBack} />
    </Form>
  );
}
