import type { ClickerRule } from "./input-schema";
import type { ClickerSetting } from "./output-schema";
import type { ClickerId, Complaint } from "./vocab";

/** How the bike rides after the first rides on the fitted setup: complaints per end. */
export interface RideFeedback {
  front: readonly Complaint[];
  rear: readonly Complaint[];
}

export interface ClickerChange {
  id: ClickerId;
  unit: ClickerSetting["unit"];
  /** Counted out from fully closed, as fitted (the approved version's position). */
  from: number;
  to: number;
  /** Every rule that moved it, each with its reason; a clamp to the adjuster's range is one too. */
  moves: { change: number; reason: string }[];
}

export interface ClickerProposal {
  changes: ClickerChange[];
  /** Complaints no clicker rule answers at that end (e.g. "rides low": springs and preload, not clickers). */
  unanswered: { end: "front" | "rear"; complaint: Complaint }[];
}

const endOf = (id: ClickerId): "front" | "rear" => (id.startsWith("fork") ? "front" : "rear");

/**
 * The next clicker step from the fitted setup, not from stock: the shop's complaint rules (the same
 * rules that set the starting positions, lib/sizing/README.md "Clickers") applied to the positions
 * the rider runs now, each complaint only on the end it was felt at (a fork complaint moves fork
 * adjusters only), then limited to each adjuster's range. Only adjusters that a rule moved are
 * listed; a move that ends where it started (opposite complaints, or a range limit) is still listed
 * with its reasons so the tuner sees why nothing changes.
 */
export function proposeClickerChanges(
  fitted: readonly ClickerSetting[],
  rules: readonly ClickerRule[],
  feedback: RideFeedback,
): ClickerProposal {
  const felt = { front: new Set(feedback.front), rear: new Set(feedback.rear) };
  const answered = { front: new Set<Complaint>(), rear: new Set<Complaint>() };
  const changes: ClickerChange[] = [];
  for (const c of fitted) {
    const end = endOf(c.id);
    const moves: ClickerChange["moves"] = [];
    let pos = c.position;
    for (const rule of rules) {
      if (rule.clicker !== c.id || rule.trigger.kind !== "complaint" || !felt[end].has(rule.trigger.complaint))
        continue;
      answered[end].add(rule.trigger.complaint);
      moves.push({ change: rule.change, reason: rule.reason });
      pos += rule.change;
    }
    if (!moves.length) continue;
    if (pos < c.min || pos > c.max) {
      const clamped = Math.min(c.max, Math.max(c.min, pos));
      moves.push({ change: clamped - pos, reason: `Limited to the adjuster's range ${c.min}–${c.max} ${c.unit}` });
      pos = clamped;
    }
    changes.push({ id: c.id, unit: c.unit, from: c.position, to: pos, moves });
  }
  const unanswered = (["front", "rear"] as const).flatMap((end) =>
    [...felt[end]].filter((complaint) => !answered[end].has(complaint)).map((complaint) => ({ end, complaint })),
  );
  return { changes, unanswered };
}
