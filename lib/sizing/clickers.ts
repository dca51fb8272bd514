import type { BikeSpec } from "./bike-schema";
import type { ClickerRule } from "./input-schema";
import type { ClickerSetting, SizingWarning } from "./output-schema";
import type { Complaint, Terrain } from "./vocab";
import { CLICKER_IDS } from "./vocab";
import { fmt } from "./format";

export interface ClickerFacts {
  complaints: readonly Complaint[];
  terrain: readonly Terrain[];
  /** chosen/stock − 1 per end; null when the end has no spring rate (air fork). */
  rateChange: { front: number | null; rear: number | null };
}

function fires(rule: ClickerRule, facts: ClickerFacts): boolean {
  const t = rule.trigger;
  if (t.kind === "complaint") return facts.complaints.includes(t.complaint);
  if (t.kind === "terrain") return facts.terrain.includes(t.terrain);
  const ch = facts.rateChange[t.end];
  if (ch === null || Math.abs(ch) < t.minChangeFraction || ch === 0) return false;
  return t.direction === "stiffer" ? ch > 0 : ch < 0;
}

/**
 * Start from the catalog's stock positions (counted out from fully closed), apply every rule that
 * fires, each move with its reason, then clamp to the adjuster's range (lib/sizing/README.md). A tuner's
 * position replaces the result for that clicker.
 */
export function applyClickerRules(
  ranges: BikeSpec["clickers"],
  rules: readonly ClickerRule[],
  facts: ClickerFacts,
  overrides: Partial<Record<(typeof CLICKER_IDS)[number], number>> | undefined,
  warnings: SizingWarning[],
): ClickerSetting[] {
  const complaints = [...new Set(facts.complaints)];
  const terrain = [...new Set(facts.terrain)];
  const f = { ...facts, complaints, terrain };
  return CLICKER_IDS.map((id) => {
    const r = ranges[id];
    const unit = id === "shockHighSpeedCompression" ? ("turns" as const) : ("clicks" as const);
    const moves: ClickerSetting["moves"] = [];
    let pos = r.stock;
    for (const rule of rules)
      if (rule.clicker === id && fires(rule, f)) {
        moves.push({ change: rule.change, reason: rule.reason });
        pos += rule.change;
      }
    const ov = overrides?.[id];
    if (ov !== undefined) {
      moves.push({ change: ov - pos, reason: "Set by the tuner" });
      pos = ov;
    }
    if (pos < r.min || pos > r.max) {
      const clamped = Math.min(r.max, Math.max(r.min, pos));
      warnings.push({
        code: "CLICKER_CLAMPED",
        severity: "info",
        message: `${id}: ${fmt(pos, 2)} ${unit} out is beyond the adjuster's ${r.min}–${r.max}; set to ${fmt(clamped, 2)}.`,
        field: `clickers.${id}`,
      });
      moves.push({ change: clamped - pos, reason: `Limited to the adjuster's range ${r.min}–${r.max} ${unit}` });
      pos = clamped;
    }
    return { id, unit, min: r.min, max: r.max, stock: r.stock, position: pos, moves };
  });
}
