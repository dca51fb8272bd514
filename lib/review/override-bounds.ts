// The tuner's figures against the bike's own ranges (its catalog spec): oil level, preload and each
// clicker. A figure outside them is refused with the range in the shop's words, on screen as it is
// typed and again by the save endpoint; nothing is clamped quietly. Pure: runs in the browser too.
import { CLICKER_LABELS } from "@/lib/labels";
import { CLICKER_IDS, type SetupOverrides, type SizingInput } from "@/lib/sizing";

const n = (v: number) => String(Math.round(v * 10) / 10);

/** `{ "front.oilLevelMm": "This fork's oil level is 80–130 mm …" }` for every figure out of range. */
export function outOfBikeRange(input: SizingInput, overrides: SetupOverrides): Record<string, string> {
  const out: Record<string, string> = {};
  const bike = input.bike;
  const fork = bike.fork;
  const oil = overrides.front?.oilLevelMm;
  if (oil !== undefined && fork.kind !== "air" && (oil < fork.oilLevelMinMm || oil > fork.oilLevelMaxMm))
    out["front.oilLevelMm"] =
      `This fork takes an oil level of ${n(fork.oilLevelMinMm)}–${n(fork.oilLevelMaxMm)} mm (from the top, its catalog range; stock ${n(fork.stockOilLevelMm)} mm). ${n(oil)} mm is outside it: check the fork's service manual.`;
  const rearPreload = overrides.rear?.preloadMm;
  if (rearPreload !== undefined && (rearPreload < bike.rear.preloadMinMm || rearPreload > bike.rear.preloadMaxMm))
    out["rear.preloadMm"] =
      `This shock's preload goes from ${n(bike.rear.preloadMinMm)} to ${n(bike.rear.preloadMaxMm)} mm; ${n(rearPreload)} mm cannot be set.`;
  const forkPreload = overrides.front?.preloadMm;
  // The catalog's fork preload range defaults to 0–0 when a model leaves it out: then it is unknown.
  const [forkMin, forkMax] = [fork.preloadMinMm ?? 0, fork.preloadMaxMm ?? 0];
  if (
    forkPreload !== undefined &&
    fork.kind !== "air" &&
    forkMax > 0 &&
    (forkPreload < forkMin || forkPreload > forkMax)
  )
    out["front.preloadMm"] =
      `This fork's preload goes from ${n(forkMin)} to ${n(forkMax)} mm; ${n(forkPreload)} mm cannot be set.`;
  for (const id of CLICKER_IDS) {
    const v = overrides.clickers?.[id];
    const range = bike.clickers[id];
    if (v === undefined) continue;
    const unit = id === "shockHighSpeedCompression" ? "turns" : "clicks";
    if (v < range.min || v > range.max)
      out[`clickers.${id}`] =
        `${CLICKER_LABELS[id]} goes from ${n(range.min)} to ${n(range.max)} ${unit} on this bike; ${n(v)} is outside it.`;
    else if (unit === "clicks" && !Number.isInteger(v))
      out[`clickers.${id}`] = `${CLICKER_LABELS[id]} is set in whole clicks: enter a whole number.`;
  }
  return out;
}
