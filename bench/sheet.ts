// Setup sheet benchmark: median time to render one sheet (invented data, generic bike class) against
// a baseline measured in the same run, a one-line react-pdf document with the same fonts. Target:
// ≤ 150 ms per sheet on the reference machine. Prints only; never asserts on time.
// After the warm-up the shaping cache (lib/pdf/shaping-cache.ts) holds every run of the sheet, as a
// running server does for the fixed text of every sheet; a sheet with new figures and names shapes
// those few runs again, so it takes somewhat longer than this median.
// Run: npx tsx bench/sheet.ts
import { Document, Page, Text, renderToBuffer } from "@react-pdf/renderer";
import { createElement as h } from "react";
import { SHEET_FONT_STACK, registerSheetFonts } from "../lib/pdf/fonts";
import { demoSheetData } from "../lib/pdf/demo-data";
import { renderSetupSheet } from "../lib/pdf/render";

registerSheetFonts();
const coil = demoSheetData();
const air = demoSheetData({ airFork: true, draft: true, paperSize: "LETTER" });
const oneLine = h(
  Document,
  null,
  h(Page, { size: "A4" }, h(Text, { style: { fontFamily: SHEET_FONT_STACK } }, "Sagwise")),
);

async function run(label: string, fn: () => Promise<unknown>, runs = 15) {
  for (let i = 0; i < 3; i++) await fn(); // warm-up: fonts parsed, JIT
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const a = performance.now();
    await fn();
    times.push(performance.now() - a);
  }
  times.sort((x, y) => x - y);
  const median = times[Math.floor(times.length / 2)]!;
  const p90 = times[Math.floor(times.length * 0.9)]!;
  console.log(
    `${label.padEnd(40)} median ${median.toFixed(1).padStart(8)} ms   p90 ${p90.toFixed(1).padStart(8)} ms   (${runs} runs)`,
  );
  return median;
}

console.log(`setup sheet benchmark: node ${process.version}, one thread`);
const base = await run("baseline: one-line react-pdf document", () =>
  renderToBuffer(oneLine as Parameters<typeof renderToBuffer>[0]),
);
const sheet = await run("setup sheet, coil fork, A4", () => renderSetupSheet(coil));
await run("setup sheet, air fork, Letter, draft", () => renderSetupSheet(air));
console.log(
  `one sheet is ${(sheet / base).toFixed(1)}× the baseline; median ${sheet.toFixed(0)} ms, target ≤ 150 ms: ${sheet <= 150 ? "met" : "NOT met"}`,
);
