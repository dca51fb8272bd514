// Sizing engine benchmark: full recommendations per second over a fixed set of inputs, the median
// time of one, and a ratio against a baseline measured in the same run (JSON round-trip of the same
// input, the least any request handler does with it). Prints only; never asserts on time.
// Run: npx tsx bench/sizing.ts
import { evaluateSetup, recommend, sizingDefaults, type SizingInput } from "../lib/sizing";

const D = sizingDefaults;
const disciplines = ["motocross", "enduro", "supercross", "trail"] as const;
const inputs: SizingInput[] = [];
for (const c of D.GENERIC_BIKE_CLASSES)
  for (const size of ["light", "medium", "heavy"] as const)
    for (const discipline of disciplines)
      inputs.push({
        rider: { massKg: c.riderBodyMassKg[size], gearIncluded: false, skill: "advanced", style: "aggressive" },
        riding: { discipline, terrain: ["sand", "roots"], jumpSize: "large" },
        bike: c.spec,
        complaints: size === "heavy" ? ["bottoming", "kicks"] : ["harsh-small-bumps"],
        stock: { forkRatesNmm: D.TYPICAL_FORK_RATES_NMM, shockRatesNmm: D.TYPICAL_SHOCK_RATES_NMM },
      });

function run(label: string, fn: (i: SizingInput) => unknown, seconds = 2) {
  for (let i = 0; i < 200; i++) fn(inputs[i % inputs.length]!); // warm-up (JIT)
  const times: number[] = [];
  const t0 = performance.now();
  let n = 0;
  while (performance.now() - t0 < seconds * 1000) {
    const a = performance.now();
    fn(inputs[n % inputs.length]!);
    times.push(performance.now() - a);
    n++;
  }
  const total = performance.now() - t0;
  times.sort((x, y) => x - y);
  const median = times[Math.floor(times.length / 2)]!;
  const p95 = times[Math.floor(times.length * 0.95)]!;
  const perSec = (n / total) * 1000;
  console.log(
    `${label.padEnd(34)} ${perSec.toFixed(0).padStart(9)} /s   median ${(median * 1000).toFixed(1).padStart(8)} µs   p95 ${(p95 * 1000).toFixed(1).padStart(8)} µs   (${n} runs)`,
  );
  return { perSec, median };
}

console.log(`sizing benchmark: ${inputs.length} fixed inputs, node ${process.version}, one thread`);
const base = run("baseline: JSON round-trip of input", (i) => JSON.parse(JSON.stringify(i)));
const rec = run("recommend (full)", (i) => recommend(i));
const ov = run("evaluateSetup with overrides", (i) =>
  evaluateSetup(i, {
    rear: { preloadMm: 10 },
    front: { oilLevelMm: i.bike.fork.stockOilLevelMm },
    clickers: { forkRebound: 10 },
  }),
);
console.log(
  `recommend is ${(base.perSec / rec.perSec).toFixed(1)}× the baseline's time per call; target ≥ 2000/s: ${rec.perSec >= 2000 ? "met" : "NOT met"}`,
);
console.log(`evaluateSetup median ${(ov.median * 1000).toFixed(0)} µs per keystroke`);
