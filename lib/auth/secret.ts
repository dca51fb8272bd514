// BETTER_AUTH_SECRET signs sessions. Production refuses to run without it; development generates one
// once and keeps it in DATA_DIR so sessions survive restarts.
import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { getEnv } from "@/lib/env";

export class MissingAuthSecretError extends Error {
  constructor() {
    super(
      "BETTER_AUTH_SECRET is not set. In production Sagwise refuses to start without it: " +
        "set it to a random string of at least 32 characters (e.g. `openssl rand -base64 32`).",
    );
    this.name = "MissingAuthSecretError";
  }
}

export function resolveAuthSecret(): string {
  const env = getEnv();
  if (env.BETTER_AUTH_SECRET) return env.BETTER_AUTH_SECRET;
  if (env.NODE_ENV === "production") throw new MissingAuthSecretError();
  const file = path.resolve(env.DATA_DIR, "auth-secret");
  try {
    const existing = readFileSync(file, "utf8").trim();
    if (existing.length >= 32) return existing;
  } catch {
    // Not generated yet.
  }
  const secret = randomBytes(32).toString("base64url");
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
