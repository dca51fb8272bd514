"use client";

import { Form } from "@/components/ui/form";

import { Field } from "@/components/ui/field";
import { RATE_UNITS } from "@/lib/sizing/vocab";
import { bikeStepSchema } from "@/lib/validations/request";
import { BikePicker } from "./bike-picker";
import { MeasureField, TextAreaField, UnitToggle, errorAt } from "./fields";
import { PhotoPicker } from "./photo-picker";
import { NOT_LISTED } from "./prepare";
import { StepActions } from "./step-actions";
import { useStepForm, type StepProps } from "./use-step-form";

interface BikeStepProps extends StepProps {
  photos: File[];
  onPhotos: (files: File[]) => void;
  photoError?: string;
}

function RateUnitSelect({
  id,
  label,
  register,
}: {
  id: string;
  label: string;
  register: ReturnType<ReturnType<typeof useStepForm>["form"]["register"]>;
}) {
  return (
    <>
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <select
        id={id}
        className="min-h-11 shrink-0 rounded-lg border border-stone-300 bg-white px-2 text-base"
        {...register}
      >
        {RATE_UNITS.map((u) => (
          <option key={u} value={u}>
            {u}
          </option>
        ))}
      </select>
    </>
  );
}

export function BikeStep({ photos, onPhotos, photoError, ...props }: BikeStepProps) {
  const length = props.metric ? "mm" : "in";
  const { form, submit } = useStepForm(
    "bike",
    bikeStepSchema,
    {
      modelId: "",
      bikeName: "",
      notListed: {
        description: "",
        rearWheelTravel: { value: "", unit: length },
        forkTravel: { value: "", unit: length },
        mass: { value: "", unit: props.metric ? "kg" : "lb" },
      },
      year: "",
      currentForkSpring: { value: "", unit: props.metric ? "N/mm" : "lbf/in" },
      currentShockSpring: { value: "", unit: props.metric ? "N/mm" : "lbf/in" },
      modifications: "",
    },
    props,
  );
  const { register, formState, watch, setValue } = form;
  const e = (path: string) => errorAt(formState.errors, path);
  const modelId = (watch("modelId") as string) ?? "";
  const notListed = modelId === NOT_LISTED;
  return (
    <Form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="Your bike">
      <BikePicker
        register={register("modelId")}
        selectedId={modelId}
        selectedName={(watch("bikeName") as string) ?? ""}
        onPick={(name) => setValue("bikeName", name)}
        error={e("modelId")}
      />
      {notListed ? (
        <div className="flex flex-col gap-4 rounded-xl border border-amber-300 bg-amber-soft p-4">
          <p className="text-sm text-stone-800">
            Tell us what you can measure. The shop starts from the nearest generic bike and checks the figures with you.
          </p>
          <Field
            id="bike-description"
            label="Make, size and type"
            hint="For example: 350 four-stroke enduro, 2019"
            error={e("notListed.description")}
            {...register("notListed.description")}
          />
          <MeasureField
            id="bike-rear-travel"
            label="Rear wheel travel"
            hint="From the owner's manual, or measured at the axle from fully extended to fully compressed."
            register={register("notListed.rearWheelTravel.value")}
            error={e("notListed.rearWheelTravel.value") ?? e("notListed.rearWheelTravel")}
            unit={
              <UnitToggle
                name="rear-travel-unit"
                legend="Rear travel unit"
                units={["mm", "in"]}
                register={register("notListed.rearWheelTravel.unit")}
              />
            }
          />
          <MeasureField
            id="bike-fork-travel"
            label="Fork travel"
            register={register("notListed.forkTravel.value")}
            error={e("notListed.forkTravel.value") ?? e("notListed.forkTravel")}
            unit={
              <UnitToggle
                name="fork-travel-unit"
                legend="Fork travel unit"
                units={["mm", "in"]}
                register={register("notListed.forkTravel.unit")}
              />
            }
          />
          <MeasureField
            id="bike-mass"
            label="Bike weight, ready to ride (optional)"
            register={register("notListed.mass.value")}
            error={e("notListed.mass.value")}
            unit={
              <UnitToggle
                name="bike-mass-unit"
                legend="Bike weight unit"
                units={["kg", "lb"]}
                register={register("notListed.mass.unit")}
              />
            }
          />
        </div>
      ) : null}
      <Field
        id="bike-year"
        label="Year (optional)"
        inputMode="numeric"
        autoComplete="off"
        error={e("year")}
        {...register("year")}
      />
      <MeasureField
        id="bike-fork-spring"
        label="Fork spring now, if known (optional)"
        register={register("currentForkSpring.value")}
        error={e("currentForkSpring.value")}
        unit={
          <RateUnitSelect
            id="bike-fork-spring-unit"
            label="Fork spring rate unit"
            register={register("currentForkSpring.unit")}
          />
        }
      />
      <MeasureField
        id="bike-shock-spring"
        label="Shock spring now, if known (optional)"
        register={register("currentShockSpring.value")}
        error={e("currentShockSpring.value")}
        unit={
          <RateUnitSelect
            id="bike-shock-spring-unit"
            label="Shock spring rate unit"
            register={register("currentShockSpring.unit")}
          />
        }
      />
      <TextAreaField
        id="bike-mods"
        label="Modifications (optional)"
        hint="Lowering link, other triple clamps, valving work…"
        register={register("modifications")}
        error={e("modifications")}
      />
      <PhotoPicker files={photos} onChange={onPhotos} serverError={photoError} />
      <StepActions onBack={props.onBack} />
    </Form>
  );
}
