// HTTP benchmark: throughput of the routes a rider and a tuner wait on, as ratios to /api/health on
// the same production server in the same run (these machines are shared; absolute figures drift).
// It starts its own seeded server (`next start` on loopback, a temporary DATA_DIR, the mail fake
// beside it), measures each route with autocannon (8 connections, a few seconds each), prints a
// table and stops everything. Prints only; never asserts on time. Beside throughput it reads the
// server's CPU time per request (/proc on Linux), which the machine's other load moves far less.
// Needs a production build (`npm run build`); run alone with `npx tsx bench/http.ts`.
import path from "node:path";
import autocannon from "autocannon";
import { DEMO_REQUESTS, stableUuid } from "../db/seed-data";
import { connectProfiler, type Profiler } from "./inspector";
import { BENCH_PASSWORD as PASSWORD, hasProductionBuild, startBenchServer, type BenchServer } from "./server";

const CONNECTIONS = 8;
const SECONDS = Number(process.env.BENCH_HTTP_SECONDS ?? 6);

type Measured = {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  non2xx: number;
  errors: number;
  /** The server's CPU milliseconds per request answered, when /proc tells. */
  cpuMs: number | null;
};

async function measure(server: BenchServer, name: string, options: autocannon.Options): Promise<Measured> {
  const cpuBefore = server.cpuSeconds();
  const result = await autocannon({ connections: CONNECTIONS, duration: SECONDS, ...options });
  const cpuAfter = server.cpuSeconds();
  const answered = result.requests.total;
  return {
    name,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
    cpuMs: cpuBefore !== null && cpuAfter !== null && answered > 0 ? ((cpuAfter - cpuBefore) * 1000) / answered : null,
  };
}

if (!hasProductionBuild()) {
  console.log("http benchmark: no production build here; run `npm run build` first. Skipped.");
} else {
  // BENCH_HTTP_PROFILE=dir writes there a V8 CPU profile of the server for each route's measured run
  // (<route>.cpuprofile, for finding where the time goes; sampling slows the server a little).
  const profileDir = process.env.BENCH_HTTP_PROFILE;
  const server = await startBenchServer("http benchmark", { inspect: Boolean(profileDir) });
  let profiler: Profiler | undefined;
  const base = server.base;
  try {
    let address = 0;
    const clientAddress = () => {
      address += 1;
      return `10.${(address >> 16) & 255}.${(address >> 8) & 255}.${address & 255}`;
    };
    const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, "x-forwarded-for": clientAddress() },
      body: JSON.stringify({ email: "tuner@sagwise.test", password: PASSWORD }),
    });
    if (!signIn.ok) throw new Error(`sign-in answered ${signIn.status}`);
    const cookie = signIn.headers
      .getSetCookie()
      .map((c) => c.split(";")[0])
      .join("; ");
    const staff = { cookie, origin: base };

    // One request of the seeded scenario, opened and saved by the tuner (a new draft version).
    const demo = DEMO_REQUESTS.find((r) => r.status === "submitted") ?? DEMO_REQUESTS[0]!;
    const answers = (n: number) => ({
      ...demo.answers,
      rider: { ...demo.answers.rider, name: `Bench Rider ${n}`, email: `bench-${n}@example.test` },
      bike: { ...demo.answers.bike, modelId: stableUuid(`bike:${demo.bikeClass}`) },
    });
    const created = await fetch(`${base}/api/requests`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, "x-forwarded-for": clientAddress() },
      body: JSON.stringify(answers(0)),
    });
    if (created.status !== 201) throw new Error(`submit answered ${created.status}: ${await created.text()}`);
    const { id } = (await created.json()) as { id: string };
    const detail = (await (await fetch(`${base}/api/requests/${id}`, { headers: staff })).json()) as {
      versions: { version: number }[];
    };
    const latest = Math.max(...detail.versions.map((v) => v.version));
    const saveBody = (version: number) =>
      JSON.stringify({ basedOnVersion: version, overrides: {}, notesForRider: "Bench notes" });
    const first = await fetch(`${base}/api/requests/${id}/recommendation`, {
      method: "PATCH",
      headers: { ...staff, "content-type": "application/json" },
      body: saveBody(latest),
    });
    if (!first.ok) throw new Error(`save answered ${first.status}: ${await first.text()}`);
    // A draft is updated in place: later saves are based on the same version.
    const draft = ((await first.json()) as { version?: number }).version ?? latest;

    let submitted = 0;
    const routes: [string, autocannon.Options][] = [
      ["health", { url: `${base}/api/health` }],
      // A floor for reading the page ratios below: a page with no data of its own (the sign-in form,
      // signed out), which costs Next.js's two renders (payload, then HTML) and the proxy's nonce.
      ["sign-in page", { url: `${base}/sign-in` }],
      ["queue page", { url: `${base}/shop`, headers: staff }],
      // What the queue page's list then asks for, with the per-status counts of its header.
      ["queue list", { url: `${base}/api/requests?counts=1`, headers: staff }],
      ["request detail page", { url: `${base}/shop/requests/${id}`, headers: staff }],
      // The same request as the API gives it (what the page's client parts and outside tools read).
      ["request detail API", { url: `${base}/api/requests/${id}`, headers: staff }],
      [
        "rider's submit",
        {
          url: `${base}/api/requests`,
          method: "POST",
          requests: [
            {
              setupRequest: (req) => {
                submitted += 1;
                return {
                  ...req,
                  headers: {
                    "content-type": "application/json",
                    origin: base,
                    "x-forwarded-for": clientAddress(),
                  },
                  body: JSON.stringify(answers(submitted)),
                };
              },
            },
          ],
        },
      ],
      [
        "recompute and save",
        {
          url: `${base}/api/requests/${id}/recommendation`,
          method: "PATCH",
          headers: { ...staff, "content-type": "application/json" },
          body: saveBody(draft),
        },
      ],
      ["sheet PDF", { url: `${base}/api/requests/${id}/sheet?version=${draft}&preview=1`, headers: staff }],
    ];

    // BENCH_HTTP_ONLY="queue page,sheet PDF" measures just those (and health).
    const only = process.env.BENCH_HTTP_ONLY?.split(",").map((n) => n.trim());
    if (only) routes.splice(0, routes.length, ...routes.filter(([name], i) => i === 0 || only.includes(name)));

    // Warm every route (JIT, caches a running server would have) before measuring.
    for (const [, options] of routes) await autocannon({ ...options, connections: 2, amount: 20 });

    if (profileDir && server.inspectPort) profiler = await connectProfiler(server.inspectPort);
    const results: Measured[] = [];
    for (const [name, options] of routes) {
      await profiler?.start();
      results.push(await measure(server, name, options));
      await profiler?.stopTo(path.join(profileDir!, `${name.replace(/\W+/g, "-")}.cpuprofile`));
    }
    // Health again at the end: the baseline is the mean of both, so a drift in the machine's load
    // during the run shows as the two differing rather than skewing every ratio.
    const healthAfter = await measure(server, "health (again)", routes[0]![1]);
    const baseline = (results[0]!.rps + healthAfter.rps) / 2;
    const healthCpu =
      results[0]!.cpuMs !== null && healthAfter.cpuMs !== null ? (results[0]!.cpuMs + healthAfter.cpuMs) / 2 : null;
    results.push(healthAfter);

    console.log(`http benchmark: node ${process.version}, ${CONNECTIONS} connections, ${SECONDS} s per route`);
    // "cpu ratio": health's CPU time per request over the route's, comparable with "ratio".
    console.log(
      `${"route".padEnd(22)}${"req/s".padStart(9)}${"ratio".padStart(8)}${"p50 ms".padStart(9)}${"p99 ms".padStart(9)}${"non-2xx".padStart(9)}${"cpu ms".padStart(9)}${"cpu ratio".padStart(11)}`,
    );
    for (const r of results) {
      const cpu = r.cpuMs === null ? "–" : r.cpuMs.toFixed(2);
      const cpuRatio = r.cpuMs === null || healthCpu === null ? "–" : (healthCpu / r.cpuMs).toFixed(3);
      console.log(
        `${r.name.padEnd(22)}${r.rps.toFixed(1).padStart(9)}${(r.rps / baseline).toFixed(3).padStart(8)}${String(r.p50).padStart(9)}${String(r.p99).padStart(9)}${String(r.non2xx + r.errors).padStart(9)}${cpu.padStart(9)}${cpuRatio.padStart(11)}`,
      );
    }
    console.log(
      `baseline: mean of the two health runs, ${baseline.toFixed(1)} req/s` +
        (healthCpu === null ? "" : `, ${healthCpu.toFixed(2)} CPU ms per request`),
    );
    if (profiler) console.log(`CPU profiles of each route's run: ${profileDir}`);
  } finally {
    profiler?.close();
    await server.stop();
  }
}
