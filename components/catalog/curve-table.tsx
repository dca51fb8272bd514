"use client";

import {
  useFieldArray,
  type Control,
  type FieldErrors,
  type UseFormGetValues,
  type UseFormRegister,
} from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { errorAt, toNumber } from "@/components/forms/apply-server-errors";
import type { BikeModelInput, BikeModelValues } from "@/lib/validations/bike";
import { ScrollBox } from "@/components/ui/scroll-box";

const LIST = "spec.rear.leverageCurve" as const;
// Any point moves the curve's integral, which the schema checks against the stroke.
const pointOptions = { setValueAs: toNumber(), deps: "spec.rear.shockStrokeMm" as const };

interface Props {
  control: Control<BikeModelInput, unknown, BikeModelValues>;
  register: UseFormRegister<BikeModelInput>;
  getValues: UseFormGetValues<BikeModelInput>;
  errors: FieldErrors<BikeModelInput>;
}

/** The leverage-ratio curve as an editable table of points (a field array of the bike form). */
export function CurveTable({ control, register, getValues, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: LIST });
  const listError = errorAt(errors, LIST);
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-semibold text-stone-800">
        Leverage-ratio curve (wheel travel per shock travel)
      </legend>
      <ScrollBox label="Leverage-ratio curve">
        <table className="text-sm">
          <thead>
            <tr className="text-left text-stone-600">
              <th scope="col" className="pr-2 font-medium">
                Point
              </th>
              <th scope="col" className="pr-2 font-medium">
                Wheel travel (mm)
              </th>
              <th scope="col" className="pr-2 font-medium">
                Ratio
              </th>
              <th scope="col">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id}>
                <td className="pr-2 tabular-nums">{i + 1}</td>
                <td className="pr-2 py-1">
                  <Field
                    id={`curve-${i}-y`}
                    label={`Point ${i + 1} wheel travel (mm)`}
                    className="[&>label]:sr-only"
                    inputMode="decimal"
                    size={6}
                    error={errorAt(errors, `${LIST}.${i}.wheelTravelMm`)}
                    {...register(`${LIST}.${i}.wheelTravelMm`, pointOptions)}
                  />
                </td>
                <td className="pr-2 py-1">
                  <Field
                    id={`curve-${i}-r`}
                    label={`Point ${i + 1} leverage ratio`}
                    className="[&>label]:sr-only"
                    inputMode="decimal"
                    size={6}
                    error={errorAt(errors, `${LIST}.${i}.ratio`)}
                    {...register(`${LIST}.${i}.ratio`, pointOptions)}
                  />
                </td>
                <td>
                  <Button
                    variant="ghost"
                    aria-label={`Remove point ${i + 1}`}
                    disabled={fields.length <= 2}
                    onClick={() => remove(i)}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      {listError ? <p className="text-sm font-medium text-red-700">{listError}</p> : null}
      <Button
        variant="secondary"
        className="self-start"
        disabled={fields.length >= 64}
        onClick={() => {
          const last = getValues(LIST).at(-1);
          append({
            wheelTravelMm: (Number.isFinite(last?.wheelTravelMm) ? last!.wheelTravelMm : 0) + 50,
            ratio: Number.isFinite(last?.ratio) ? last!.ratio : 2,
          });
        }}
      >
        Add point
      </Button>
    </fieldset>
  );
}
