// A CPU profile of another Node process for just the span a benchmark chooses: the process is
// started with `--inspect=127.0.0.1:PORT` and this client drives V8's Profiler over the inspector
// protocol (https://chromedevtools.github.io/devtools-protocol/v8/Profiler/), so start-up and
// warm-up stay out of the profile. The .cpuprofile files open in Chrome DevTools or speedscope.
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";
import WebSocket from "ws";

export interface Profiler {
  /** Starts sampling (every `intervalUs` microseconds). */
  start(): Promise<void>;
  /** Stops sampling and writes what was sampled since start() to `file`. */
  stopTo(file: string): Promise<void>;
  close(): void;
}

export async function connectProfiler(port: number, intervalUs = 250): Promise<Profiler> {
  const targets = (await (await fetch(`http://127.0.0.1:${port}/json/list`)).json()) as {
    webSocketDebuggerUrl: string;
  }[];
  const socket = new WebSocket(targets[0]!.webSocketDebuggerUrl);
  await new Promise((resolve, reject) => socket.once("open", resolve).once("error", reject));
  let lastId = 0;
  const waiting = new Map<number, (result: unknown) => void>();
  socket.on("message", (data) => {
    const message = JSON.parse(String(data)) as { id?: number; result?: unknown };
    if (message.id === undefined) return;
    waiting.get(message.id)?.(message.result);
    waiting.delete(message.id);
  });
  const call = <T>(method: string, params?: object) =>
    new Promise<T>((resolve) => {
      lastId += 1;
      waiting.set(lastId, resolve as (result: unknown) => void);
      socket.send(JSON.stringify({ id: lastId, method, params }));
    });
  await call("Profiler.enable");
  await call("Profiler.setSamplingInterval", { interval: intervalUs });
  return {
    start: () => call("Profiler.start"),
    async stopTo(file) {
      const { profile } = await call<{ profile: unknown }>("Profiler.stop");
      mkdirSync(dirname(file), { recursive: true });
      writeFileSync(file, JSON.stringify(profile));
    },
    close: () => socket.close(),
  };
}
