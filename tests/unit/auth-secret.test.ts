// BETTER_AUTH_SECRET: required in production, generated once and kept in DATA_DIR in development.
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { MissingAuthSecretError, resolveAuthSecret } from "@/lib/auth/secret";
import { resetEnvForTests } from "@/lib/env";

const dirs: string[] = [];
function useEnv(values: Record<string, string | undefined>) {
  for (const [key, value] of Object.entries(values)) vi.stubEnv(key, value as string);
  resetEnvForTests();
}

afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvForTests();
  for (const dir of dirs.splice(0)) rmSync(dir, { recursive: true, force: true });
});

describe("resolveAuthSecret", () => {
  it("refuses to run in production without BETTER_AUTH_SECRET", () => {
    useEnv({ NODE_ENV: "production", BETTER_AUTH_SECRET: "" });
    expect(() => resolveAuthSecret()).toThrow(MissingAuthSecretError);
  });

  it("uses the configured secret when set", () => {
    useEnv({ NODE_ENV: "production", BETTER_AUTH_SECRET: "s".repeat(40) });
    expect(resolveAuthSecret()).toBe("s".repeat(40));
  });

  it("rejects a configured secret shorter than 32 characters, naming the variable", () => {
    useEnv({ NODE_ENV: "production", BETTER_AUTH_SECRET: "short" });
    expect(() => resolveAuthSecret()).toThrow(/BETTER_AUTH_SECRET/);
  });

  it("generates a development secret once and keeps it in DATA_DIR", () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-secret-"));
    dirs.push(dir);
    useEnv({ NODE_ENV: "development", BETTER_AUTH_SECRET: "", DATA_DIR: dir });
    const first = resolveAuthSecret();
    expect(first.length).toBeGreaterThanOrEqual(32);
    expect(readFileSync(path.join(dir, "auth-secret"), "utf8").trim()).toBe(first);
    expect(resolveAuthSecret()).toBe(first);
  });
});
