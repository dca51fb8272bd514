// A job the app's own process runs a little after start and then at a fixed interval. The timers
// never keep a script or a test process alive; a failed run is logged and the next one tries again.
const started = new Set<string>();

export interface PeriodicJob {
  /** Names the job in the log; a second start of the same name does nothing. */
  name: string;
  run: () => Promise<unknown>;
  firstRunMs: number;
  everyMs: number;
}

export function startPeriodic({ name, run, firstRunMs, everyMs }: PeriodicJob): void {
  if (started.has(name)) return;
  started.add(name);
  const runLogged = () =>
    void run().catch((error: unknown) => {
      console.error(`[sagwise] ${name} failed: ${(error as Error).message}`);
    });
  setTimeout(runLogged, firstRunMs).unref();
  setInterval(runLogged, everyMs).unref();
}
