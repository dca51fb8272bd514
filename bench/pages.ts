// Page benchmark: what a rider's phone loads. For the landing page and the request form on a seeded
// production server (bench/server.ts) it reports
// - first-load JavaScript: every script the HTML asks for, gzip-compressed (zlib's default level, as
//   a server would send it), and the form's total as a ratio to the landing page's;
// - Lighthouse 12 (its default mobile configuration, Debian's Chromium headless): performance, best
//   practices and accessibility scores and total blocking time, the median of BENCH_PAGES_RUNS runs
//   (3; 0 skips Lighthouse), with Lighthouse's benchmark index of the host ("host"): its simulated
//   4x CPU slowdown multiplies what this machine's CPU takes, so on a slower or busier host the
//   blocking time grows with no change to the pages (Lighthouse docs/throttling.md, "CPU throttling").
// Prints only; never asserts. Needs a production build; run alone with `npx tsx bench/pages.ts`.
import { gzipSync } from "node:zlib";
import { existsSync } from "node:fs";
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
import { hasProductionBuild, startBenchServer } from "./server";

const PAGES = ["/", "/request"];
const RUNS = Number(process.env.BENCH_PAGES_RUNS ?? 3);
const CHROME = process.env.CHROME_PATH ?? "/usr/bin/chromium";

/** The scripts a page's HTML loads (src of <script>), each once. */
function scriptsOf(html: string, base: string): string[] {
  const found = new Set<string>();
  for (const m of html.matchAll(/<script\b[^>]*\bsrc="([^"]+)"/g)) found.add(new URL(m[1]!, base).href);
  return [...found];
}

async function firstLoadJs(base: string, page: string): Promise<{ scripts: number; gzipBytes: number }> {
  const html = await (await fetch(`${base}${page}`)).text();
  const scripts = scriptsOf(html, base);
  let gzipBytes = 0;
  for (const src of scripts) {
    const body = Buffer.from(await (await fetch(src, { headers: { "accept-encoding": "identity" } })).arrayBuffer());
    gzipBytes += gzipSync(body).length;
  }
  return { scripts: scripts.length, gzipBytes };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

interface Scores {
  performance: number;
  bestPractices: number;
  accessibility: number;
  tbtMs: number;
  failing: string[];
  /** Lighthouse's own measure of the host's CPU (about 1000 for a mid-tier phone's target host). */
  benchmarkIndex: number;
}

async function lighthouseRun(url: string, port: number): Promise<Scores> {
  const result = await lighthouse(url, {
    port,
    output: "json",
    logLevel: "error",
    onlyCategories: ["performance", "best-practices", "accessibility"],
  });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const { categories, audits } = result.lhr;
  // What keeps best practices or accessibility below 100, by audit id, for the table's last column.
  const failing = ["best-practices", "accessibility"].flatMap((c) =>
    (categories[c]?.auditRefs ?? []).filter((r) => r.weight > 0 && (audits[r.id]?.score ?? 1) < 1).map((r) => r.id),
  );
  return {
    performance: Math.round((categories.performance?.score ?? 0) * 100),
    bestPractices: Math.round((categories["best-practices"]?.score ?? 0) * 100),
    accessibility: Math.round((categories.accessibility?.score ?? 0) * 100),
    tbtMs: Math.round(audits["total-blocking-time"]?.numericValue ?? 0),
    failing,
    benchmarkIndex: Math.round(result.lhr.environment.benchmarkIndex),
  };
}

if (!hasProductionBuild()) {
  console.log("pages benchmark: no production build here; run `npm run build` first. Skipped.");
} else {
  const server = await startBenchServer("pages benchmark", { timeBoundMs: 8 * 60_000 });
  try {
    const js = await Promise.all(PAGES.map((p) => firstLoadJs(server.base, p)));
    console.log("first-load JavaScript (gzip)");
    for (const [i, p] of PAGES.entries())
      console.log(
        `${p.padEnd(12)}${String(js[i]!.scripts).padStart(4)} scripts${(js[i]!.gzipBytes / 1024).toFixed(1).padStart(9)} KiB${(js[i]!.gzipBytes / js[0]!.gzipBytes).toFixed(2).padStart(7)} × landing`,
      );

    if (RUNS < 1) {
      console.log("Lighthouse: BENCH_PAGES_RUNS is 0. Skipped.");
    } else if (!existsSync(CHROME)) {
      console.log(`Lighthouse: no Chromium at ${CHROME} (set CHROME_PATH). Skipped.`);
    } else {
      const chrome = await chromeLauncher.launch({
        chromePath: CHROME,
        chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu"],
      });
      try {
        console.log(`Lighthouse 12.2.3 mobile, median of ${RUNS} runs`);
        console.log(
          `${"page".padEnd(12)}${"perf".padStart(6)}${"best pr.".padStart(10)}${"a11y".padStart(6)}${"TBT ms".padStart(8)}${"host".padStart(7)}  below 100`,
        );
        for (const p of PAGES) {
          await lighthouseRun(`${server.base}${p}`, chrome.port); // warm the server's caches
          const runs: Scores[] = [];
          for (let i = 0; i < RUNS; i++) runs.push(await lighthouseRun(`${server.base}${p}`, chrome.port));
          const failing = [...new Set(runs.flatMap((r) => r.failing))].join(", ") || "—";
          console.log(
            `${p.padEnd(12)}${String(median(runs.map((r) => r.performance))).padStart(6)}${String(median(runs.map((r) => r.bestPractices))).padStart(10)}${String(median(runs.map((r) => r.accessibility))).padStart(6)}${String(median(runs.map((r) => r.tbtMs))).padStart(8)}${String(median(runs.map((r) => r.benchmarkIndex))).padStart(7)}  ${failing}`,
          );
        }
      } finally {
        chrome.kill();
      }
    }
  } finally {
    await server.stop();
  }
}
