// A seeded production server for a benchmark: `scripts/server.ts` (the app as `npm start` runs it)
// on a loopback port with its own temporary data folder and the mail fake beside it. It needs a
// production build (`npm run build`); `stop()` ends both processes and removes the folder, and a
// hard time bound stops them whatever the benchmark does.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { freePort, stopChild, waitFor } from "../scripts/child-processes";

export const BENCH_PASSWORD = process.env.DEMO_PASSWORD ?? "sagwise-demo";
const SECRET = "bench-secret-bench-secret-bench-secret-0123";

export function hasProductionBuild(): boolean {
  return existsSync(path.join(".next", "BUILD_ID"));
}

export interface BenchServer {
  base: string;
  /** The app's inspector port when started with `inspect` (see bench/inspector.ts). */
  inspectPort?: number;
  /**
   * CPU seconds the app process has used so far (user + system, from /proc on Linux; null
   * elsewhere). Per request it drifts far less with the machine's other load than throughput does.
   */
  cpuSeconds(): number | null;
  stop(): Promise<void>;
}

// Clock ticks per second of /proc/<pid>/stat's utime and stime: USER_HZ, 100 on Linux
// (proc(5): "measured in clock ticks (divide by sysconf(_SC_CLK_TCK))").
const CLOCK_TICKS = Number(spawnSync("getconf", ["CLK_TCK"], { encoding: "utf8" }).stdout.trim()) || 100;

function cpuSecondsOf(pid: number | undefined): number | null {
  if (!pid) return null;
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    // Fields after the command name, which is in parentheses and may itself hold spaces.
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    // proc(5) numbers utime and stime 14 and 15, counting from pid = 1; fields[0] here is field 3.
    return (Number(fields[11]) + Number(fields[12])) / CLOCK_TICKS;
  } catch {
    return null;
  }
}

/**
 * Seeds a fresh data folder and starts the app and the mail fake. `inspect` opens the app's
 * inspector on a free loopback port (`inspectPort`), for CPU profiles of chosen spans
 * (bench/inspector.ts); `timeBoundMs` is when everything is stopped and the process exits.
 */
export async function startBenchServer(
  name: string,
  { inspect = false, timeBoundMs = 10 * 60_000 }: { inspect?: boolean; timeBoundMs?: number } = {},
): Promise<BenchServer> {
  const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-bench-"));
  const [appPort, mailPort, debugPort] = await Promise.all([freePort(), freePort(), freePort()]);
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
    // Every submission comes from its own invented client address (X-Forwarded-For), as riders do,
    // so the per-client limits of a real shop do not turn a benchmark into a 429 count.
    TRUST_PROXY_HOPS: "1",
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/prepare-data.ts", "--seed"], { env, stdio: "ignore" });
  if (seeded.status !== 0) throw new Error("Seeding the benchmark database failed");
  const mail = spawn("npx", ["tsx", "fakes/mail/server.ts"], { env, detached: true, stdio: "ignore" });
  const profiling = inspect ? [`--inspect=127.0.0.1:${debugPort}`] : [];
  const app = spawn("node", [...profiling, "--import", "tsx", "scripts/server.ts"], {
    env,
    detached: true,
    stdio: "ignore",
  });
  const stop = async () => {
    clearTimeout(hardStop);
    await Promise.all([stopChild(app), stopChild(mail)]);
    rmSync(dataDir, { recursive: true, force: true, maxRetries: 5 });
  };
  const hardStop = setTimeout(() => {
    console.error(`${name}: over its time bound, stopping`);
    void stop().finally(() => process.exit(1));
  }, timeBoundMs);
  try {
    await waitFor(`${base}/api/health`, app, "server");
  } catch (error) {
    await stop();
    throw error;
  }
  return {
    base,
    inspectPort: inspect ? debugPort : undefined,
    cpuSeconds: () => cpuSecondsOf(app.pid),
    stop,
  };
}
