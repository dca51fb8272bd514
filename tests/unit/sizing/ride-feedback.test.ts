// After the first rides: the clicker rules propose the next step from the fitted positions, each
// complaint on its own end, each move with its reason, within the adjuster's range. Cases worked by
// hand from the default rules (lib/sizing/defaults.ts, common practice: out = softer or faster).
import { describe, expect, it } from "vitest";
import { proposeClickerChanges, sizingDefaults, type ClickerSetting } from "@/lib/sizing";

const rules = sizingDefaults.DEFAULT_CLICKER_RULES;
const fitted: ClickerSetting[] = [
  { id: "forkCompression", unit: "clicks", min: 0, max: 20, stock: 12, position: 10, moves: [] },
  { id: "forkRebound", unit: "clicks", min: 0, max: 20, stock: 12, position: 12, moves: [] },
  { id: "shockLowSpeedCompression", unit: "clicks", min: 0, max: 20, stock: 12, position: 12, moves: [] },
  { id: "shockHighSpeedCompression", unit: "turns", min: 0, max: 3, stock: 1.5, position: 1.25, moves: [] },
  { id: "shockRebound", unit: "clicks", min: 0, max: 20, stock: 12, position: 1, moves: [] },
];

describe("proposeClickerChanges", () => {
  it("moves from the fitted position, not from stock", () => {
    // Fork still bottoms at 10 out: the bottoming rule firms it 2 more, 10 − 2 = 8.
    const { changes } = proposeClickerChanges(fitted, rules, { front: ["bottoming"], rear: [] });
    expect(changes).toEqual([
      {
        id: "forkCompression",
        unit: "clicks",
        from: 10,
        to: 8,
        moves: [{ change: -2, reason: "Bottoming: firm fork compression 2 clicks" }],
      },
    ]);
  });

  it("a complaint moves only the end it was felt at", () => {
    // Bottoming at the rear: shock high-speed a quarter turn firmer, 1.25 − 0.25 = 1; the fork stays.
    const { changes } = proposeClickerChanges(fitted, rules, { front: [], rear: ["bottoming"] });
    expect(changes.map((c) => [c.id, c.to])).toEqual([["shockHighSpeedCompression", 1]]);
  });

  it("stops at the adjuster's range and says so", () => {
    // Rear kicks at 1 out: slow rebound 2 clicks would be −1; limited to 0.
    const { changes } = proposeClickerChanges(fitted, rules, { front: [], rear: ["kicks"] });
    expect(changes[0]).toMatchObject({ id: "shockRebound", from: 1, to: 0 });
    expect(changes[0]!.moves.map((m) => m.reason)).toEqual([
      "Rear kicks: slow shock rebound 2 clicks",
      "Limited to the adjuster's range 0–20 clicks",
    ]);
  });

  it("names the complaints no clicker rule answers at that end", () => {
    const { changes, unanswered } = proposeClickerChanges(fitted, rules, { front: ["rides-low", "kicks"], rear: [] });
    expect(changes).toEqual([]);
    expect(unanswered).toEqual([
      { end: "front", complaint: "rides-low" },
      { end: "front", complaint: "kicks" },
    ]);
  });
});
