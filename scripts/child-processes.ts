// Helpers for the programs that start the app's servers as child processes (the browser tests'
// global setup, the benchmarks): a free loopback port, waiting until a URL answers, stopping a
// detached child with its whole process group.
import type { ChildProcess } from "node:child_process";
import net from "node:net";

/** A TCP port nobody listens on right now (the system picks it). */
export function freePort(): Promise<number> {
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

/** Resolves once `url` answers 2xx; throws when `child` exits first or after 90 s. */
export async function waitFor(url: string, child: ChildProcess, what: string): Promise<void> {
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

/**
 * Stops a child started with `detached: true` and its group (the negative pid reaches npx and the
 * server it started) with SIGTERM, and with SIGKILL if it is still there after 10 s; resolves once
 * it has exited.
 */
export function stopChild(child: ChildProcess): Promise<void> {
  const pid = child.pid;
  if (!pid || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  const signal = (name: NodeJS.Signals) => {
    try {
      process.kill(-pid, name);
      return true;
    } catch {
      return false; // Already gone.
    }
  };
  return new Promise<void>((resolve) => {
    const force = setTimeout(() => signal("SIGKILL"), 10_000);
    child.once("exit", () => {
      clearTimeout(force);
      resolve();
    });
    if (!signal("SIGTERM")) {
      clearTimeout(force);
      resolve();
    }
  });
}
