"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Field } from "@/components/ui/field";
import { toNumber } from "@/components/forms/apply-server-errors";
import { SPRING_STEELS, SPRING_STEEL_IDS, type StressVerdict } from "@/lib/sizing";
import { DEFAULT_SHEAR_MODULUS_MPA, END_TYPES, coilGeometrySchema } from "@/lib/validations/tools";
import { CalcCard, Result } from "./calc-card";
import { coilReport } from "./spring-math";

type Schema = typeof coilGeometrySchema;
type NumKey = Exclude<keyof z.input<Schema>, "endType" | "steel">;
// Cross-field checks (OD against wire, coils against end type) are shown on the dependent field.
const DEPS: Partial<Record<NumKey, NumKey[]>> = { wireDiameterMm: ["outerDiameterMm"] };

export function CoilSpringTool() {
  const { register, control, formState } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(coilGeometrySchema),
    mode: "onChange",
    defaultValues: {
      endType: "squared-ground",
      shearModulusMpa: DEFAULT_SHEAR_MODULUS_MPA,
      loadN: 0,
      steel: "chrome-silicon",
    },
  });
  // The results read the live values through the same schema; errors show once a field is changed.
  const parsed = coilGeometrySchema.safeParse(useWatch({ control }));
  const report = parsed.success ? coilReport(parsed.data) : null;
  const n = (k: NumKey, label: string, hint?: string) => (
    <Field
      id={`coil-${k}`}
      label={label}
      hint={hint}
      inputMode="decimal"
      error={formState.errors[k]?.message}
      {...register(k, { setValueAs: toNumber(), deps: DEPS[k] })}
    />
  );
  return (
    <CalcCard
      id="coil-tool"
      title="Spring check from wire and coils"
      formula={
        <>
          k = G·d⁴ / (8·D³·nₐ) with D = OD − d; C = D/d; K_W = (4C − 1)/(4C − 4) + 0.615/C; τ = K_W·8·F·D/(π·d³). Active
          coils nₐ by end type: squared and ground or squared: total − 2; plain: total; plain and ground: total − 1.
        </>
      }
      source="Shigley, Mechanical Engineering Design, 10th ed.: eq. 10-9 (rate), eq. 10-4 (Wahl factor), eqs. 10-1 and 10-4 (stress), table 10-1 (end types); G ≈ 79.3 GPa for steel spring wire, table 10-5; minimum tensile strength S_ut = A/d^m, table 10-4 (ASTM wire grades); allowable torsional stress for static service, before set removed, as a fraction of S_ut, table 10-6."
    >
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {n("wireDiameterMm", "Wire diameter d (mm)")}
        {n("outerDiameterMm", "Outer diameter OD (mm)")}
        {n("totalCoils", "Total coils")}
        <label className="flex flex-col gap-1 text-sm font-medium">
          End type
          <select
            className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
            {...register("endType", { deps: ["totalCoils"] })}
          >
            {Object.entries(END_TYPES).map(([k, t]) => (
              <option key={k} value={k}>
                {t.label}
              </option>
            ))}
          </select>
        </label>
        {n("shearModulusMpa", "Shear modulus G (MPa)", "79 300 MPa for steel spring wire")}
        {n(
          "loadN",
          "Load for the stress check (N)",
          "The load at the spring's shortest length in use (coil bind is worst)",
        )}
        <label className="flex flex-col gap-1 text-sm font-medium">
          Wire steel
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" {...register("steel")}>
            {SPRING_STEEL_IDS.map((k) => (
              <option key={k} value={k}>
                {SPRING_STEELS[k].label}
              </option>
            ))}
          </select>
        </label>
      </div>
      {report ? (
        <dl aria-label="Spring check results">
          <Result label="Mean diameter D" value={`${report.meanDiameterMm.toFixed(2)} mm`} />
          <Result label="Active coils" value={report.activeCoils.toFixed(2)} />
          <Result
            label="Spring rate"
            value={`${report.rate.nMm.toFixed(2)} N/mm · ${report.rate.kgfMm.toFixed(3)} kgf/mm · ${report.rate.lbfIn.toFixed(0)} lbf/in`}
          />
          <Result label="Spring index C" value={report.springIndex.toFixed(2)} />
          <Result label="Wahl factor" value={report.wahlFactor.toFixed(3)} />
          <Result label="Shear stress at the load" value={`${report.shearStressMpa.toFixed(0)} MPa`} />
          {report.verdict ? <StressResult v={report.verdict} /> : null}
        </dl>
      ) : (
        <p className="text-sm text-stone-600">Enter the measurements to see the rate.</p>
      )}
      <p className="text-xs text-stone-600">
        A spring index below 4 or above 12 is hard to make and to trust (Shigley §10-2). A compressed spring stores
        energy: measure springs out of the shock or fork, and work to the manufacturer&apos;s service manual.
      </p>
    </CalcCard>
  );
}

/** Pass or fail against the wire's allowable stress, with the margin in words. */
function StressResult({ v }: { v: StressVerdict }) {
  const used = ((v.shearStressMpa / v.allowableShearMpa) * 100).toFixed(0);
  const margin = (v.margin * 100).toFixed(0);
  const spec = SPRING_STEELS[v.steel];
  return (
    <>
      <Result
        label="Minimum tensile strength of the wire"
        value={`${v.minTensileStrengthMpa.toFixed(0)} MPa (${spec.label})`}
      />
      <Result
        label="Allowable shear stress"
        value={`${v.allowableShearMpa.toFixed(0)} MPa (${(spec.allowableFraction * 100).toFixed(0)} % of the tensile strength)`}
      />
      <div
        className={v.pass ? "rounded-lg bg-emerald-50 p-2 text-emerald-950" : "rounded-lg bg-red-50 p-2 text-red-900"}
      >
        <dt className="font-semibold">Stress check</dt>
        <dd>
          {v.pass
            ? `Pass: the stress is ${used} % of the allowable (margin ${margin} %).`
            : `Fail: the stress is ${used} % of the allowable (margin ${margin} %). The spring may take a set or break: do not use it at this load.`}
          {v.outsideTable
            ? ` This wire diameter is outside the ${spec.diameterMm[0]}–${spec.diameterMm[1]} mm the table covers: treat the strength as an estimate.`
            : ""}
        </dd>
      </div>
    </>
  );
}
