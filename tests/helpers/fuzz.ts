// Shared by the fuzz tests of the public endpoints (tests/integration/fuzz-*.test.ts): hostile
// values, bodies near a valid one, and the check that a refusal is a 4xx that wrote nothing.
import fc from "fast-check";
import { expect } from "vitest";
import { PEER_HEADER } from "@/lib/api/client-address";
import { ORIGIN } from "./auth";
import "./client";
import { totalRows } from "./rows";

export const RUNS = 1000;
const SEED = 20261202;

// Each body from its own address (198.18.0.0/15, RFC 2544's benchmark range; a header only), so the
// limiters answer for the body, not for the flood.
let clients = 0;
export const nextClient = () => ({ [PEER_HEADER]: `198.18.${(++clients >> 8) & 255}.${clients & 255}` });

export const hostileString = fc.oneof(
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 40 }),
  fc.constantFrom(
    "\u0000",
    "a\u0000b",
    "Name\u0000",
    "\ud800",
    "\udfff x",
    "../../etc/passwd",
    "%00",
    "' or 1=1 --",
    "<script>alert(1)</script>",
    "x".repeat(5000),
    "",
    " ",
    "NaN",
    "1e309",
    "-0",
  ),
);
const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: hostileString },
  fc.integer(),
  fc.double({ noNaN: true }),
  fc.constantFrom(null, true, false, 0, -1, 1e308, Number.MAX_SAFE_INTEGER + 2),
  fc.array(hostileString, { maxLength: 3 }),
  fc.dictionary(hostileString, hostileString, { maxKeys: 3 }),
);

type Path = (string | number)[];
function leafPaths(value: unknown, prefix: Path = []): Path[] {
  if (value && typeof value === "object") {
    const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
    const paths = entries.flatMap(([k, v]) => leafPaths(v, [...prefix, k]));
    return prefix.length ? [prefix, ...paths] : paths;
  }
  return [prefix];
}
function mutate(base: unknown, path: Path, mode: "replace" | "nul" | "delete", value: unknown): unknown {
  const copy = structuredClone(base) as Record<string | number, unknown>;
  let parent: Record<string | number, unknown> = copy;
  for (const key of path.slice(0, -1)) {
    const child = parent[key];
    // An earlier change already replaced or removed this branch: nothing left to change here.
    if (!child || typeof child !== "object") return copy;
    parent = child as Record<string | number, unknown>;
  }
  const last = path.at(-1)!;
  if (mode === "delete") delete parent[last];
  else if (mode === "nul")
    parent[last] = typeof parent[last] === "string" ? `${parent[last] as string}\u0000` : "\u0000";
  else parent[last] = value;
  return copy;
}

/** Bodies near a valid one (most of them invalid in one place), plus any JSON and raw garbage. */
export function bodiesAround(valid: unknown): fc.Arbitrary<string> {
  const paths = leafPaths(valid);
  const mutated = fc
    .tuple(
      fc.array(
        fc.record({
          at: fc.nat({ max: paths.length - 1 }),
          mode: fc.constantFrom("replace", "nul", "nul", "delete"),
          value: hostileValue,
        }),
        { minLength: 1, maxLength: 3 },
      ),
    )
    .map(([changes]) =>
      JSON.stringify(
        changes.reduce((body, c) => mutate(body, paths[c.at]!, c.mode as "replace" | "nul" | "delete", c.value), valid),
      ),
    );
  return fc.oneof(
    { weight: 6, arbitrary: mutated },
    { weight: 2, arbitrary: fc.jsonValue().map((v) => JSON.stringify(v)) },
    { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 200 }) },
  );
}

export async function expectNo5xx(
  arbitrary: fc.Arbitrary<string>,
  send: (body: string) => Promise<Response>,
  options: { allowWrites?: (status: number) => boolean } = {},
) {
  const tally = new Map<number, number>();
  await fc.assert(
    fc.asyncProperty(arbitrary, async (body) => {
      const before = await totalRows();
      const response = await send(body);
      tally.set(response.status, (tally.get(response.status) ?? 0) + 1);
      const after = await totalRows();
      expect(response.status, `answered ${response.status} to ${JSON.stringify(body).slice(0, 300)}`).toBeLessThan(500);
      // A refusal writes nothing; rate limiting would hide the body, so it must not happen here.
      expect(response.status).not.toBe(429);
      if (response.status >= 400 || !options.allowWrites?.(response.status)) expect(after - before).toBe(0);
      if (response.status >= 400) {
        const json = (await response.json()) as { error?: unknown; message?: unknown };
        expect(typeof (json.error ?? json.message)).toBe("string");
      }
    }),
    { numRuns: RUNS, seed: SEED, endOnFailure: true },
  );
  return tally;
}

export const json = (url: string, body: string, method = "POST") =>
  new Request(`${ORIGIN()}${url}`, {
    method,
    headers: { "content-type": "application/json", origin: ORIGIN(), ...nextClient() },
    body,
  });
