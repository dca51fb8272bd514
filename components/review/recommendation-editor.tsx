"use client";

import { Form } from "@/components/ui/form";

// The adjust editor: every change re-runs the engine at once and shows the consequences against the
// engine's own proposal; "Save draft" stores the overrides (the server recomputes), "Approve" freezes
// the saved draft and e-mails the rider.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { ForceChart } from "@/components/charts/force-chart";
import { Button } from "@/components/ui/button";
import { forkForceChart, rearForceChart } from "@/lib/charts/recommendation-charts";
import { callApi, errorWithFields } from "@/lib/api-client";
import { diffOverrides } from "@/lib/review/overrides-diff";
import type { SetupOverrides, SizingInput } from "@/lib/sizing";
import { editorSchema, flatErrors, overridesFrom, valuesFrom, type EditorValues } from "./editor-state";
import { ApproveConfirm, type ApproveRider } from "./approve-confirm";
import { ClickerInputs, FrontInputs, RearInputs } from "./figure-inputs";
import { evaluateLive } from "./live-result";
import { NotesInputs } from "./notes-inputs";
import { RateBasisInput } from "./rate-basis-input";
import { ResultsTable } from "./results-table";
import { ReasonsList, SafetyNote, WarningsList } from "./warnings-list";

const NOT_SENT = "No connection to the server. Nothing was changed; try again.";

export interface EditableVersion {
  version: number;
  state: "draft" | "approved" | "superseded";
  overrides: SetupOverrides;
  notesForRider: string | null;
  internalNotes: string | null;
}

export function RecommendationEditor({
  requestId,
  input,
  latest,
  rider,
}: {
  requestId: string;
  input: SizingInput;
  latest: EditableVersion;
  /** Who the approval e-mails, shown before approving. */
  rider: ApproveRider;
}) {
  const router = useRouter();
  const initial = useMemo(() => valuesFrom(latest.overrides, latest.notesForRider, latest.internalNotes), [latest]);
  const [message, setMessage] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const [acknowledged, setAcknowledged] = useState(false);
  const [confirming, setConfirming] = useState(false);

  const engine = useMemo(() => evaluateLive(input, {}), [input]);
  const air = engine.ok && engine.rec.front.kind === "air";
  // The form's state lives in react-hook-form; its resolver checks the typed values with the save
  // endpoint's own schema. Every change re-renders (useWatch), so the engine runs on every keystroke.
  const form = useForm<EditorValues>({
    defaultValues: initial,
    mode: "onChange",
    resolver: zodResolver(editorSchema(air, input) as never) as unknown as Resolver<EditorValues>,
  });
  const values = { ...initial, ...useWatch({ control: form.control }) } as EditorValues;
  const schemaErrors = flatErrors(form.formState.errors);
  const { overrides } = overridesFrom(values, air);
  // Re-run on every render: the engine takes well under a millisecond.
  const live = evaluateLive(input, overrides);
  // The last figures that computed (by value), so the screen does not jump while a value is half typed.
  const overridesKey = JSON.stringify(overrides);
  const [lastGood, setLastGood] = useState(() => ({ key: overridesKey, rec: live.ok ? live.rec : null }));
  if (live.ok && lastGood.key !== overridesKey) setLastGood({ key: overridesKey, rec: live.rec });
  const shown = live.ok ? live.rec : lastGood.rec;
  const errors = { ...serverErrors, ...schemaErrors, ...(live.ok ? {} : live.errors) };

  const dirty =
    diffOverrides(latest.overrides, overrides).length > 0 ||
    values.notesForRider.trim() !== (latest.notesForRider ?? "") ||
    values.internalNotes.trim() !== (latest.internalNotes ?? "");
  const frozen = latest.state !== "draft";
  const invalid = Object.keys(schemaErrors).length > 0 || !live.ok;

  if (!engine.ok || !shown)
    return (
      <p role="alert">
        The engine could not size this request: {Object.values(engine.ok ? {} : engine.errors).join("; ")}
      </p>
    );

  const set = (patch: Partial<EditorValues>) => {
    for (const [name, value] of Object.entries(patch))
      form.setValue(name as keyof EditorValues, value as never, { shouldDirty: true, shouldValidate: true });
    setServerErrors({});
    setMessage(null);
    setConfirming(false);
  };

  async function save(): Promise<number | null> {
    const r = await callApi<{ version: number }>(
      `/api/requests/${requestId}/recommendation`,
      "PATCH",
      {
        basedOnVersion: latest.version,
        overrides,
        notesForRider: values.notesForRider,
        internalNotes: values.internalNotes,
      },
      { offline: NOT_SENT },
    );
    if (!r.ok) {
      setServerErrors(Object.fromEntries(Object.entries(r.fields).map(([k, m]) => [k.replace(/^overrides\./, ""), m])));
      setMessage({ kind: "error", text: errorWithFields(r) });
      return null;
    }
    return r.data.version;
  }

  async function run(action: "save" | "approve") {
    setBusy(true);
    setMessage(null);
    setConfirming(false);
    try {
      let version: number | null = latest.version;
      if (dirty) version = await save();
      if (version === null) return;
      if (action === "approve") {
        const acknowledgedWarnings =
          acknowledged && shown ? shown.warnings.filter((w) => w.requiresAcknowledgement).map((w) => w.code) : [];
        const r = await callApi(
          `/api/requests/${requestId}/approve`,
          "POST",
          { version, acknowledgedWarnings },
          { offline: NOT_SENT },
        );
        if (!r.ok) return setMessage({ kind: "error", text: errorWithFields(r) });
        // The e-mail is queued with the approval and goes out at once; E-mails below shows how it went.
        setMessage({
          kind: "ok",
          text: `Version ${version} approved. The rider is being e-mailed the sheet link (see E-mails below).`,
        });
      } else setMessage({ kind: "ok", text: `Saved as draft version ${version}.` });
      router.refresh();
    } finally {
      setBusy(false);
    }
  }

  const r = shown;
  // Critical warnings and sanity limits both need the tuner's tick; the server refuses unticked sanity limits.
  const critical = r.warnings.filter((w) => w.severity === "critical" || w.requiresAcknowledgement);
  return (
    <section aria-labelledby="adjust-heading" className="flex flex-col gap-4">
      <h2 id="adjust-heading" className="text-xl font-semibold">
        Adjust version {latest.version}
        {frozen ? " (approved)" : " (draft)"}
      </h2>
      {frozen ? (
        <p className="rounded-lg border border-sky-200 bg-sky-50 px-3 py-2 text-sm text-sky-900">
          Version {latest.version} is approved and frozen. Saving a change creates version {latest.version + 1} as a
          draft; approving it sends the rider the revised sheet.
        </p>
      ) : null}
      <p role="status" aria-label="Predicted sag" className="rounded-lg bg-pine-50 px-3 py-2 text-sm text-pine-900">
        Predicted rear race sag {r.rear.predicted.raceSagMm.toFixed(1)} mm, static{" "}
        {r.rear.predicted.staticSagMm.toFixed(1)} mm; fork race sag {r.front.predicted.raceSagMm.toFixed(1)} mm, static{" "}
        {r.front.predicted.staticSagMm.toFixed(1)} mm.
        {!live.ok ? " (Showing the last valid figures: fix the marked field.)" : ""}
      </p>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <Form
          className="flex flex-col gap-6"
          aria-label="Adjust the recommendation"
          onSubmit={form.handleSubmit(() => run("save"))}
        >
          <RateBasisInput
            value={values.rateBasis}
            onChange={(rateBasis) => set({ rateBasis })}
            used={r.resolved.rateBasis}
          />
          <RearInputs
            v={values}
            set={set}
            engine={engine.rec}
            errors={errors}
            stock={input.stock.shockRatesNmm}
            current={input.currentSprings?.shockRateNmm}
          />
          <FrontInputs
            v={values}
            set={set}
            engine={engine.rec}
            errors={errors}
            stock={input.stock.forkRatesNmm}
            current={input.currentSprings?.forkRateNmm}
          />
          <ClickerInputs v={values} set={set} engine={engine.rec} errors={errors} />
          <NotesInputs v={values} set={set} />
          {message ? (
            <p
              role={message.kind === "error" ? "alert" : "status"}
              className={`rounded-lg px-3 py-2 text-sm ${message.kind === "error" ? "bg-red-50 text-red-900" : "bg-emerald-50 text-emerald-900"}`}
            >
              {message.text}
            </p>
          ) : null}
          {critical.length ? (
            <label className="flex items-start gap-2 rounded-lg border border-red-300 bg-red-50 px-3 py-2 text-sm text-red-900">
              <input
                type="checkbox"
                className="mt-1 size-5"
                checked={acknowledged}
                onChange={(e) => setAcknowledged(e.target.checked)}
              />
              <span>
                This setup has {critical.length} warning{critical.length === 1 ? "" : "s"} to check (see the list). I
                have checked them against the manufacturer&apos;s manual and approve anyway.
              </span>
            </label>
          ) : null}
          <div className="flex flex-wrap gap-3">
            <Button type="submit" variant="secondary" disabled={busy || invalid || !dirty}>
              {frozen ? `Save as version ${latest.version + 1} (draft)` : "Save draft"}
            </Button>
            <Button
              onClick={() => void form.handleSubmit(() => setConfirming(true))()}
              disabled={busy || invalid || confirming || (frozen && !dirty) || (critical.length > 0 && !acknowledged)}
            >
              {dirty ? "Save and approve" : "Approve"} — e-mail the rider
            </Button>
            <Button
              variant="ghost"
              disabled={busy || !dirty}
              onClick={() => {
                form.reset(initial);
                setServerErrors({});
                setMessage(null);
              }}
            >
              Undo unsaved changes
            </Button>
          </div>
          {confirming ? (
            <ApproveConfirm
              rider={rider}
              version={frozen ? latest.version + 1 : latest.version}
              revised={frozen || latest.version > 1}
              rec={r}
              notesForRider={values.notesForRider}
              busy={busy}
              onConfirm={() => void run("approve")}
              onCancel={() => setConfirming(false)}
            />
          ) : null}
        </Form>
        <div className="flex flex-col gap-4">
          <ResultsTable engine={engine.rec} current={r} caption="Consequences, recomputed as you type" />
          <WarningsList warnings={r.warnings} />
          <SafetyNote />
        </div>
      </div>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <ForceChart title="Shock: wheel force against rear wheel travel" spec={rearForceChart(r)} />
        <ForceChart title="Fork: force against fork travel" spec={forkForceChart(r)} />
      </div>
      <details className="rounded-lg border border-stone-200 bg-white p-3">
        <summary className="cursor-pointer font-medium">Why these figures (engine reasons)</summary>
        <ReasonsList reasons={r.reasons} />
      </details>
    </section>
  );
}
