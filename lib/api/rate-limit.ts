// Per-client limits for public endpoints that write (rate-limiter-flexible, in memory: one app
// instance per shop; a multi-instance deployment would swap in its PostgreSQL or Redis limiter).
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { HttpError } from "./respond";

/** The client's address: the first X-Forwarded-For hop set by the proxy in front, else X-Real-IP. */
export function clientKey(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || request.headers.get("x-real-ip")?.trim() || "local";
}

export function createLimiter(points: number, durationSeconds: number) {
  const limiter = new RateLimiterMemory({ points, duration: durationSeconds });
  return async function consume(request: Request): Promise<void> {
    try {
      await limiter.consume(clientKey(request));
    } catch (result) {
      if (!(result instanceof RateLimiterRes)) throw result;
      const retryAfter = Math.max(1, Math.ceil(result.msBeforeNext / 1000));
      throw new HttpError(429, `Too many requests from this connection. Try again in ${retryAfter} seconds.`, undefined, {
        "Retry-After": String(retryAfter),
      });
    }
  };
}
