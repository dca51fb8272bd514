// HTTP benchmark: throughput of the routes a rider and a tuner wait on, as ratios to /api/health on
// the same production server in the same run (these machines are shared; absolute figures drift).
// It starts its own seeded server (`next start` on loopback, a temporary DATA_DIR, the mail fake
// beside it), measures each route with autocannon (8 connections, a few seconds each), prints a
// table and stops everything. Prints only; never asserts on time.
// Needs a production build (`npm run build`); run alone with `npx tsx bench/http.ts`.
import autocannon from "autocannon";
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { DEMO_REQUESTS, stableUuid } from "../db/seed-data";

const CONNECTIONS = 8;
const SECONDS = Number(process.env.BENCH_HTTP_SECONDS ?? 6);
const PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
const SECRET = "bench-secret-bench-secret-bench-secret-0123";

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() =>
        typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port")),
      );
    });
  });
}

async function waitFor(url: string, child: ChildProcess, what: string) {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`${what} exited with ${child.exitCode}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${what} did not answer at ${url}`);
}

/** Stops a detached child and its group; resolves once it has exited. */
function stop(child: ChildProcess): Promise<void> {
  if (!child.pid || child.exitCode !== null) return Promise.resolve();
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  try {
    process.kill(-child.pid, "SIGTERM");
  } catch {
    return Promise.resolve();
  }
  return exited;
}

type Measured = { name: string; rps: number; p50: number; p99: number; non2xx: number; errors: number };

async function measure(name: string, options: autocannon.Options): Promise<Measured> {
  const result = await autocannon({ connections: CONNECTIONS, duration: SECONDS, ...options });
  return {
    name,
    rps: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
  };
}

if (!existsSync(path.join(".next", "BUILD_ID"))) {
  console.log("http benchmark: no production build here; run `npm run build` first. Skipped.");
} else {
  const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-bench-"));
  const [appPort, mailPort] = await Promise.all([freePort(), freePort()]);
  const base = `http://127.0.0.1:${appPort}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    PORT: String(appPort),
    DATA_DIR: dataDir,
    DATABASE_URL: "",
    BETTER_AUTH_SECRET: SECRET,
    BETTER_AUTH_URL: base,
    RESEND_BASE_URL: `http://127.0.0.1:${mailPort}`,
    MAIL_FAKE_PORT: String(mailPort),
    MAIL_FAKE_DIR: path.join(dataDir, "mail-fake"),
    // Every submission comes from its own invented client address (X-Forwarded-For below), as riders
    // do, so the per-client limits of a real shop do not turn the benchmark into a 429 count.
    TRUST_PROXY_HOPS: "1",
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/prepare-data.ts", "--seed"], { env, stdio: "ignore" });
  if (seeded.status !== 0) throw new Error("Seeding the benchmark database failed");
  const mail = spawn("npx", ["tsx", "fakes/mail/server.ts"], { env, detached: true, stdio: "ignore" });
  // BENCH_HTTP_PROFILE=dir writes a V8 CPU profile of the server there (for finding where time goes).
  const profile = process.env.BENCH_HTTP_PROFILE;
  const profiling = profile ? ["--cpu-prof", `--cpu-prof-dir=${profile}`] : [];
  const app = spawn("node", [...profiling, "--import", "tsx", "scripts/server.ts"], {
    env,
    detached: true,
    stdio: "ignore",
  });
  const hardStop = setTimeout(() => {
    console.error("http benchmark: over its time bound, stopping");
    void stop(app);
    void stop(mail);
    process.exit(1);
  }, 10 * 60_000);
  try {
    await waitFor(`${base}/api/health`, app, "server");

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
      ["queue page", { url: `${base}/shop`, headers: staff }],
      ["request detail page", { url: `${base}/shop/requests/${id}`, headers: staff }],
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

    const results: Measured[] = [];
    for (const [name, options] of routes) results.push(await measure(name, options));
    // Health again at the end: the baseline is the mean of both, so a drift in the machine's load
    // during the run shows as the two differing rather than skewing every ratio.
    const healthAfter = await measure("health (again)", routes[0]![1]);
    const baseline = (results[0]!.rps + healthAfter.rps) / 2;
    results.push(healthAfter);

    console.log(`http benchmark: node ${process.version}, ${CONNECTIONS} connections, ${SECONDS} s per route`);
    console.log(
      `${"route".padEnd(22)}${"req/s".padStart(9)}${"ratio".padStart(8)}${"p50 ms".padStart(9)}${"p99 ms".padStart(9)}${"non-2xx".padStart(9)}`,
    );
    for (const r of results) {
      console.log(
        `${r.name.padEnd(22)}${r.rps.toFixed(1).padStart(9)}${(r.rps / baseline).toFixed(3).padStart(8)}${String(r.p50).padStart(9)}${String(r.p99).padStart(9)}${String(r.non2xx + r.errors).padStart(9)}`,
      );
    }
    console.log(`baseline: mean of the two health runs, ${baseline.toFixed(1)} req/s`);
  } finally {
    clearTimeout(hardStop);
    await Promise.all([stop(app), stop(mail)]);
    rmSync(dataDir, { recursive: true, force: true, maxRetries: 5 });
  }
}
