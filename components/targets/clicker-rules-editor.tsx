"use client";

// The clicker rules table: trigger (complaint, terrain or a large spring change) → clicker, change,
// reason. Saved as a whole (the order is kept); "reset" restores the engine's default rules.
import { CLICKER_LABELS, COMPLAINT_LABELS, RATE_TRIGGER_LABELS, TERRAIN_LABELS } from "@/lib/labels";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Controller, useFieldArray, useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { applyServerErrors, errorAt, toNumber } from "@/components/forms/apply-server-errors";
import { callApi } from "@/lib/api-client";
import { CLICKER_IDS, COMPLAINTS, TERRAINS, type ClickerRule } from "@/lib/sizing";
import { clickerRulesSchema } from "@/lib/validations/targets";
import { ScrollBox } from "@/components/ui/scroll-box";

type Trigger = ClickerRule["trigger"];
const RATE_TRIGGERS = ["rear-stiffer", "rear-softer", "front-stiffer", "front-softer"] as const;

function triggerKey(t: Trigger): string {
  return t.kind === "complaint"
    ? `complaint:${t.complaint}`
    : t.kind === "terrain"
      ? `terrain:${t.terrain}`
      : `rate:${t.end}-${t.direction}`;
}

function triggerFrom(key: string, old: Trigger): Trigger {
  const [kind, value] = key.split(":") as [string, string];
  if (kind === "complaint") return { kind: "complaint", complaint: value as never };
  if (kind === "terrain") return { kind: "terrain", terrain: value as never };
  const [end, direction] = value.split("-") as ["front" | "rear", "stiffer" | "softer"];
  return {
    kind: "rate-change",
    end,
    direction,
    minChangeFraction: old.kind === "rate-change" ? old.minChangeFraction : 0.08,
  };
}

const cell = "min-h-11 rounded-lg border border-stone-300 bg-white px-2 text-sm";

type Schema = typeof clickerRulesSchema;
const NEW_RULE: ClickerRule = {
  trigger: { kind: "complaint", complaint: "bottoming" },
  clicker: "forkCompression",
  change: -1,
  reason: "",
};

export function ClickerRulesEditor({ initial }: { initial: ClickerRule[] }) {
  const router = useRouter();
  const { control, register, handleSubmit, setError, reset, formState } = useForm<
    z.input<Schema>,
    unknown,
    z.output<Schema>
  >({
    resolver: zodResolver(clickerRulesSchema),
    defaultValues: { rules: initial },
  });
  const { fields, append, remove } = useFieldArray({ control, name: "rules" });
  const [message, setMessage] = useState<string | null>(null);
  const err = (path: string) => errorAt(formState.errors, path);

  const save = handleSubmit(
    async (values) => {
      const r = await callApi("/api/shop/targets/rules", "PUT", values);
      if (!r.ok)
        return setMessage([r.error, ...applyServerErrors(setError, r.fields, { fields: ["rules"] })].join(" "));
      setMessage("Rules saved.");
      router.refresh();
    },
    () => setMessage("Some rules need attention."),
  );
  async function resetRules() {
    const r = await callApi<{ rules: ClickerRule[] }>("/api/shop/targets/rules", "DELETE");
    if (!r.ok) return setMessage(r.error);
    reset({ rules: r.data.rules });
    setMessage("Back to the engine's default rules.");
  }
  const problem = (path: string) => {
    const text = err(path);
    return { invalid: text ? true : undefined, note: text ? <p className="text-xs text-red-700">{text}</p> : null };
  };

  return (
    <section
      aria-labelledby="clicker-rules"
      className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
    >
      <h2 id="clicker-rules" className="font-semibold">
        Clicker rules
      </h2>
      <p className="text-sm text-stone-600">
        Change in clicks (turns for shock high-speed); a positive change is out, less damping. Rate-change rules fire
        when the chosen spring differs from stock by at least the given share.
      </p>
      <ScrollBox label="Clicker rules">
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="text-stone-600">
              <th scope="col">When</th>
              <th scope="col">Clicker</th>
              <th scope="col">Change</th>
              <th scope="col">Reason shown to the rider</th>
              <th scope="col">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => {
              const change = problem(`rules.${i}.change`);
              const reason = problem(`rules.${i}.reason`);
              return (
                <tr key={f.id} className="align-top">
                  <td className="py-1 pr-2">
                    <Controller
                      control={control}
                      name={`rules.${i}.trigger`}
                      render={({ field }) => (
                        <select
                          aria-label={`Rule ${i + 1} trigger`}
                          className={cell}
                          value={triggerKey(field.value)}
                          onChange={(e) => field.onChange(triggerFrom(e.target.value, field.value))}
                          onBlur={field.onBlur}
                          ref={field.ref}
                        >
                          <optgroup label="Complaint">
                            {COMPLAINTS.map((c) => (
                              <option key={c} value={`complaint:${c}`}>
                                {COMPLAINT_LABELS[c]}
                              </option>
                            ))}
                          </optgroup>
                          <optgroup label="Terrain">
                            {TERRAINS.map((t) => (
                              <option key={t} value={`terrain:${t}`}>
                                {TERRAIN_LABELS[t]}
                              </option>
                            ))}
                          </optgroup>
                          <optgroup label="Spring change">
                            {RATE_TRIGGERS.map((t) => (
                              <option key={t} value={`rate:${t}`}>
                                {RATE_TRIGGER_LABELS[t]}
                              </option>
                            ))}
                          </optgroup>
                        </select>
                      )}
                    />
                    {problem(`rules.${i}.trigger`).note}
                  </td>
                  <td className="py-1 pr-2">
                    <select aria-label={`Rule ${i + 1} clicker`} className={cell} {...register(`rules.${i}.clicker`)}>
                      {CLICKER_IDS.map((c) => (
                        <option key={c} value={c}>
                          {CLICKER_LABELS[c]}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <input
                      aria-label={`Rule ${i + 1} change`}
                      aria-invalid={change.invalid}
                      className={`${cell} w-20`}
                      inputMode="decimal"
                      {...register(`rules.${i}.change`, { setValueAs: toNumber() })}
                    />
                    {change.note}
                  </td>
                  <td className="py-1 pr-2">
                    <input
                      aria-label={`Rule ${i + 1} reason`}
                      aria-invalid={reason.invalid}
                      className={`${cell} w-full min-w-64`}
                      {...register(`rules.${i}.reason`)}
                    />
                    {reason.note}
                  </td>
                  <td className="py-1">
                    <Button variant="ghost" aria-label={`Remove rule ${i + 1}`} onClick={() => remove(i)}>
                      Remove
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollBox>
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => append(NEW_RULE)}>
          Add rule
        </Button>
        <Button onClick={save} disabled={formState.isSubmitting}>
          Save rules
        </Button>
        <Button variant="secondary" onClick={resetRules}>
          Reset to default rules
        </Button>
      </div>
      {err("rules") ? <p className="text-sm font-medium text-red-700">{err("rules")}</p> : null}
      {message ? (
        <p role="status" className="text-sm">
          {message}
        </p>
      ) : null}
    </section>
  );
}
