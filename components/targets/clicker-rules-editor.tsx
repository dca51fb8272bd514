"use client";

// The clicker rules table: trigger (complaint, terrain or a large spring change) → clicker, change,
// reason. Saved as a whole (the order is kept); "reset" restores the engine's default rules.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi, issuesByPath } from "@/components/catalog/form-utils";
import { CLICKER_IDS, COMPLAINTS, TERRAINS, type ClickerRule } from "@/lib/sizing";
import { clickerRulesSchema } from "@/lib/validations/targets";

type Trigger = ClickerRule["trigger"];
const RATE_TRIGGERS = ["rear-stiffer", "rear-softer", "front-stiffer", "front-softer"] as const;

function triggerKey(t: Trigger): string {
  return t.kind === "complaint" ? `complaint:${t.complaint}` : t.kind === "terrain" ? `terrain:${t.terrain}` : `rate:${t.end}-${t.direction}`;
}

function triggerFrom(key: string, old: Trigger): Trigger {
  const [kind, value] = key.split(":") as [string, string];
  if (kind === "complaint") return { kind: "complaint", complaint: value as never };
  if (kind === "terrain") return { kind: "terrain", terrain: value as never };
  const [end, direction] = value.split("-") as ["front" | "rear", "stiffer" | "softer"];
  return { kind: "rate-change", end, direction, minChangeFraction: old.kind === "rate-change" ? old.minChangeFraction : 0.08 };
}

const cell = "min-h-11 rounded-lg border border-stone-300 bg-white px-2 text-sm";

export function ClickerRulesEditor({ initial }: { initial: ClickerRule[] }) {
  const router = useRouter();
  const [rules, setRules] = useState<ClickerRule[]>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  // Bumped on reset so the uncontrolled "change" inputs show the restored numbers.
  const [version, setVersion] = useState(0);
  const set = (i: number, patch: Partial<ClickerRule>) => setRules((rs) => rs.map((r, j) => (j === i ? { ...r, ...patch } : r)));

  async function save() {
    const parsed = clickerRulesSchema.safeParse({ rules });
    if (!parsed.success) {
      setErrors(issuesByPath(parsed.error));
      return setMessage("Some rules need attention.");
    }
    const r = await callApi("/api/shop/targets/rules", "PUT", { rules });
    if (!r.ok) return (setErrors(r.fields), setMessage(r.error));
    setErrors({});
    setMessage("Rules saved.");
    router.refresh();
  }
  async function reset() {
    const r = await callApi<{ rules: ClickerRule[] }>("/api/shop/targets/rules", "DELETE");
    if (!r.ok) return setMessage(r.error);
    setRules(r.data.rules);
    setVersion((v) => v + 1);
    setErrors({});
    setMessage("Back to the engine's default rules.");
  }

  return (
    <section aria-labelledby="clicker-rules" className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4">
      <h2 id="clicker-rules" className="font-semibold">Clicker rules</h2>
      <p className="text-sm text-stone-600">Change in clicks (turns for shock high-speed); a positive change is out, less damping. Rate-change rules fire when the chosen spring differs from stock by at least the given share.</p>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead><tr className="text-stone-600"><th scope="col">When</th><th scope="col">Clicker</th><th scope="col">Change</th><th scope="col">Reason shown to the rider</th><th scope="col"><span className="sr-only">Remove</span></th></tr></thead>
          <tbody key={version}>
            {rules.map((r, i) => (
              <tr key={i} className="align-top">
                <td className="py-1 pr-2">
                  <select aria-label={`Rule ${i + 1} trigger`} className={cell} value={triggerKey(r.trigger)} onChange={(e) => set(i, { trigger: triggerFrom(e.target.value, r.trigger) })}>
                    <optgroup label="Complaint">{COMPLAINTS.map((c) => <option key={c} value={`complaint:${c}`}>{c}</option>)}</optgroup>
                    <optgroup label="Terrain">{TERRAINS.map((t) => <option key={t} value={`terrain:${t}`}>{t}</option>)}</optgroup>
                    <optgroup label="Spring change">{RATE_TRIGGERS.map((t) => <option key={t} value={`rate:${t}`}>{t.replace("-", " spring ")}</option>)}</optgroup>
                  </select>
                </td>
                <td className="py-1 pr-2">
                  <select aria-label={`Rule ${i + 1} clicker`} className={cell} value={r.clicker} onChange={(e) => set(i, { clicker: e.target.value as ClickerRule["clicker"] })}>
                    {CLICKER_IDS.map((c) => <option key={c} value={c}>{c}</option>)}
                  </select>
                </td>
                <td className="py-1 pr-2">
                  <input aria-label={`Rule ${i + 1} change`} aria-invalid={errors[`rules.${i}.change`] ? true : undefined} className={`${cell} w-20`} inputMode="decimal" defaultValue={r.change} onChange={(e) => set(i, { change: Number(e.target.value) })} />
                  {errors[`rules.${i}.change`] ? <p className="text-xs text-red-700">{errors[`rules.${i}.change`]}</p> : null}
                </td>
                <td className="py-1 pr-2">
                  <input aria-label={`Rule ${i + 1} reason`} aria-invalid={errors[`rules.${i}.reason`] ? true : undefined} className={`${cell} w-full min-w-64`} value={r.reason} onChange={(e) => set(i, { reason: e.target.value })} />
                  {errors[`rules.${i}.reason`] ? <p className="text-xs text-red-700">{errors[`rules.${i}.reason`]}</p> : null}
                </td>
                <td className="py-1"><Button variant="ghost" aria-label={`Remove rule ${i + 1}`} onClick={() => setRules((rs) => rs.filter((_, j) => j !== i))}>Remove</Button></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => setRules((rs) => [...rs, { trigger: { kind: "complaint", complaint: "bottoming" }, clicker: "forkCompression", change: -1, reason: "" }])}>Add rule</Button>
        <Button onClick={save}>Save rules</Button>
        <Button variant="secondary" onClick={reset}>Reset to default rules</Button>
      </div>
      {message ? <p role="status" className="text-sm">{message}</p> : null}
    </section>
  );
}
