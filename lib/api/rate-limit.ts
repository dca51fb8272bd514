// Per-client limits for public endpoints that write (rate-limiter-flexible). With PGlite there is
// one app process, so counters live in memory; with DATABASE_URL several instances may share the
// database, so counters live there too (RateLimiterPostgres on the app's pg pool, one table, one
// key prefix per limit) and hold across instances.
import {
  RateLimiterMemory,
  RateLimiterPostgres,
  RateLimiterRes,
  type RateLimiterAbstract,
} from "rate-limiter-flexible";
import type { Pool } from "pg";
import { getDatabase, type DatabaseHandle } from "@/db/client";
import { clientKey } from "./client-address";
import { HttpError } from "./respond";

/** Created by rate-limiter-flexible itself (CREATE TABLE IF NOT EXISTS), outside the app's migrations. */
export const RATE_LIMIT_TABLE = "rate_limit_counters";

interface LimitRule {
  name: string;
  points: number;
  durationSeconds: number;
}

function postgresLimiter(pool: Pool, rule: LimitRule): Promise<RateLimiterAbstract> {
  return new Promise((resolve, reject) => {
    const limiter: RateLimiterPostgres = new RateLimiterPostgres(
      {
        storeClient: pool,
        storeType: "pool",
        tableName: RATE_LIMIT_TABLE,
        keyPrefix: rule.name,
        points: rule.points,
        duration: rule.durationSeconds,
        clearExpiredByTimeout: true,
      },
      (error?: unknown) => (error ? reject(error) : resolve(limiter)),
    );
  });
}

/** The pool behind a PostgreSQL handle (drizzle's node-postgres database keeps it as $client). */
function poolOf(handle: DatabaseHandle): Pool {
  return (handle.db as unknown as { $client: Pool }).$client;
}

export function createLimiter(name: string, points: number, durationSeconds: number) {
  const rule = { name, points, durationSeconds };
  const memory = new RateLimiterMemory({ keyPrefix: name, points, duration: durationSeconds });
  // One PostgreSQL limiter per database handle (tests swap databases; the app has one).
  const byHandle = new WeakMap<DatabaseHandle, Promise<RateLimiterAbstract>>();

  async function limiterFor(): Promise<RateLimiterAbstract> {
    const handle = await getDatabase();
    if (handle.kind !== "postgres") return memory;
    let pending = byHandle.get(handle);
    if (!pending) {
      pending = postgresLimiter(poolOf(handle), rule);
      pending.catch(() => byHandle.delete(handle));
      byHandle.set(handle, pending);
    }
    return pending;
  }

  return async function consume(request: Request | Headers): Promise<void> {
    const limiter = await limiterFor();
    try {
      await limiter.consume(clientKey(request));
    } catch (result) {
      if (!(result instanceof RateLimiterRes)) throw result;
      const retryAfter = Math.max(1, Math.ceil(result.msBeforeNext / 1000));
      throw new HttpError(
        429,
        `Too many requests from this connection. Try again in ${retryAfter} seconds.`,
        undefined,
        {
          "Retry-After": String(retryAfter),
        },
      );
    }
  };
}
