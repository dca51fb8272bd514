"use client";

// Inputs of the adjust editor. Every input is empty when the engine's own choice stands; the
// placeholder shows that choice.
import { Field } from "@/components/ui/field";
import { formatNumber } from "@/lib/format";
import { RATE_UNITS, convertRate, type ClickerId, type RateUnit, type Recommendation } from "@/lib/sizing";
import type { EditorValues, FieldErrors } from "./editor-state";
import { CLICKER_LABELS } from "./figures";

type Set = (patch: Partial<EditorValues>) => void;
const fixed = (v: number | null | undefined, d: number) => (v === null || v === undefined ? "" : v.toFixed(d));
const selectClass = "min-h-11 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base";

function NumberInput(props: {
  id: string;
  label: string;
  value: string;
  engine: string;
  error?: string;
  onChange: (v: string) => void;
}) {
  return (
    <Field
      id={props.id}
      label={props.label}
      value={props.value}
      placeholder={props.engine}
      inputMode="decimal"
      autoComplete="off"
      error={props.error}
      hint={props.engine ? `Engine: ${props.engine}` : undefined}
      onChange={(e) => props.onChange(e.target.value)}
    />
  );
}

const threeUnits = (nMm: number) =>
  `${formatNumber(nMm, 1)} N/mm (${formatNumber(convertRate(nMm, "N/mm", "kgf/mm"), 2)} kgf/mm, ${formatNumber(convertRate(nMm, "N/mm", "lbf/in"), 0)} lbf/in)`;

function RateInput(props: {
  id: string;
  label: string;
  value: string;
  unit: RateUnit;
  engineNmm: number | null;
  stockNmm: number[];
  /** The spring the rider has fitted now (N/mm), when they told us. */
  currentNmm?: number;
  error?: string;
  onChange: (value: string, unit: RateUnit) => void;
}) {
  const digits = props.unit === "lbf/in" ? 0 : props.unit === "kgf/mm" ? 3 : 2;
  const inUnit = (nMm: number) => convertRate(nMm, "N/mm", props.unit).toFixed(digits);
  const engine = props.engineNmm === null ? "" : `${inUnit(props.engineNmm)} ${props.unit}`;
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-stone-200 p-3">
      <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
        {props.label} from stock
        <select
          className={selectClass}
          value=""
          onChange={(e) => e.target.value && props.onChange(inUnit(Number(e.target.value)), props.unit)}
        >
          <option value="">Pick a spring on the shelf…</option>
          {props.stockNmm.map((r) => (
            <option key={r} value={r}>
              {threeUnits(r)}
            </option>
          ))}
        </select>
      </label>
      <p className="text-sm text-stone-700">
        {props.currentNmm === undefined ? (
          "The rider did not give the spring fitted now."
        ) : (
          <>Rider&apos;s spring now: {threeUnits(props.currentNmm)}</>
        )}
      </p>
      <div className="grid grid-cols-[minmax(0,1fr)_auto] items-start gap-2">
        <NumberInput
          id={props.id}
          label={props.label}
          value={props.value}
          engine={engine}
          error={props.error}
          onChange={(v) => props.onChange(v, props.unit)}
        />
        <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
          Unit
          <select
            aria-label={`${props.label} unit`}
            className={selectClass}
            value={props.unit}
            onChange={(e) => {
              const to = e.target.value as RateUnit;
              const n = Number(props.value.replace(",", "."));
              // Keep the same spring when only the unit changes.
              const converted =
                props.value.trim() && Number.isFinite(n)
                  ? String(Number(convertRate(n, props.unit, to).toFixed(4)))
                  : props.value;
              props.onChange(converted, to);
            }}
          >
            {RATE_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </label>
      </div>
    </div>
  );
}

interface EndInputsProps {
  v: EditorValues;
  set: Set;
  engine: Recommendation;
  errors: FieldErrors;
  stock: number[];
  /** The rider's spring fitted now at this end (N/mm). */
  current?: number;
}

export function RearInputs({ v, set, engine, errors, stock, current }: EndInputsProps) {
  const t = engine.rear.sagTargets;
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-lg font-semibold">Shock</legend>
      <RateInput
        id="rear-rate"
        label="Shock spring rate"
        value={v.rearRate}
        unit={v.rearRateUnit}
        engineNmm={engine.rear.chosenRate.nMm}
        stockNmm={stock}
        currentNmm={current}
        error={errors["rear.rateNmm"]}
        onChange={(rearRate, rearRateUnit) => set({ rearRate, rearRateUnit })}
      />
      <NumberInput
        id="rear-preload"
        label="Shock preload (mm)"
        value={v.rearPreload}
        engine={fixed(engine.rear.preloadMm, 1)}
        error={errors["rear.preloadMm"]}
        onChange={(rearPreload) => set({ rearPreload })}
      />
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <NumberInput
          id="rear-race"
          label="Rear race sag target (mm)"
          value={v.rearRaceSag}
          engine={fixed(t.raceSagMm, 0)}
          error={errors["rear.raceSagMm"]}
          onChange={(rearRaceSag) => set({ rearRaceSag })}
        />
        <NumberInput
          id="rear-static-min"
          label="Rear static sag min (mm)"
          value={v.rearStaticMin}
          engine={fixed(t.staticSagMinMm, 0)}
          error={errors["rear.staticSagMinMm"]}
          onChange={(rearStaticMin) => set({ rearStaticMin })}
        />
        <NumberInput
          id="rear-static-max"
          label="Rear static sag max (mm)"
          value={v.rearStaticMax}
          engine={fixed(t.staticSagMaxMm, 0)}
          error={errors["rear.staticSagMaxMm"]}
          onChange={(rearStaticMax) => set({ rearStaticMax })}
        />
      </div>
    </fieldset>
  );
}

export function FrontInputs({ v, set, engine, errors, stock, current }: EndInputsProps) {
  const f = engine.front;
  const t = f.sagTargets;
  const air = f.kind === "air";
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-lg font-semibold">
        Fork ({air ? "air spring" : f.kind === "coil-single" ? "one coil spring" : "coil springs in both legs"})
      </legend>
      {air ? (
        <NumberInput
          id="front-air"
          label="Fork air pressure (kPa, gauge)"
          value={v.frontAirKpa}
          engine={fixed(f.airPressure?.kpaGauge, 0)}
          error={errors["front.airPressureKpaGauge"]}
          onChange={(frontAirKpa) => set({ frontAirKpa })}
        />
      ) : (
        <>
          <RateInput
            id="front-rate"
            label="Fork spring rate (per spring)"
            value={v.frontRate}
            unit={v.frontRateUnit}
            engineNmm={f.chosenRate?.nMm ?? null}
            stockNmm={stock}
            currentNmm={current}
            error={errors["front.rateNmm"]}
            onChange={(frontRate, frontRateUnit) => set({ frontRate, frontRateUnit })}
          />
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            <NumberInput
              id="front-preload"
              label="Fork preload (mm)"
              value={v.frontPreload}
              engine={fixed(f.preloadMm, 1)}
              error={errors["front.preloadMm"]}
              onChange={(frontPreload) => set({ frontPreload })}
            />
            <NumberInput
              id="front-oil"
              label="Fork oil level (mm from top)"
              value={v.frontOilLevel}
              engine={fixed(f.oilLevelMm, 0)}
              error={errors["front.oilLevelMm"]}
              onChange={(frontOilLevel) => set({ frontOilLevel })}
            />
          </div>
        </>
      )}
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <NumberInput
          id="front-race"
          label="Fork race sag target (mm)"
          value={v.frontRaceSag}
          engine={fixed(t.raceSagMm, 0)}
          error={errors["front.raceSagMm"]}
          onChange={(frontRaceSag) => set({ frontRaceSag })}
        />
        <NumberInput
          id="front-static-min"
          label="Fork static sag min (mm)"
          value={v.frontStaticMin}
          engine={fixed(t.staticSagMinMm, 0)}
          error={errors["front.staticSagMinMm"]}
          onChange={(frontStaticMin) => set({ frontStaticMin })}
        />
        <NumberInput
          id="front-static-max"
          label="Fork static sag max (mm)"
          value={v.frontStaticMax}
          engine={fixed(t.staticSagMaxMm, 0)}
          error={errors["front.staticSagMaxMm"]}
          onChange={(frontStaticMax) => set({ frontStaticMax })}
        />
      </div>
    </fieldset>
  );
}

export function ClickerInputs({
  v,
  set,
  engine,
  errors,
}: {
  v: EditorValues;
  set: Set;
  engine: Recommendation;
  errors: FieldErrors;
}) {
  return (
    <fieldset className="grid grid-cols-1 gap-3 sm:grid-cols-2">
      <legend className="mb-2 text-lg font-semibold">Clickers (counted out from fully closed)</legend>
      {engine.clickers.map((c) => (
        <NumberInput
          key={c.id}
          id={`clicker-${c.id}`}
          label={`${CLICKER_LABELS[c.id]} (${c.unit}, ${c.min}–${c.max})`}
          value={v.clickers[c.id] ?? ""}
          engine={String(c.position)}
          error={errors[`clickers.${c.id}`]}
          onChange={(text) => set({ clickers: { ...v.clickers, [c.id as ClickerId]: text } })}
        />
      ))}
    </fieldset>
  );
}
