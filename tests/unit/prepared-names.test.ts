// Every prepared query (db/prepared.ts) has a name of its own: on a PostgreSQL server node-postgres
// keeps a named statement per connection and refuses a second text under a name it already has
// ("Prepared statements must be unique"), so two queries sharing a name would fail only there.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOTS = ["app", "db", "lib", "components"];

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return sources(full);
    return /\.tsx?$/.test(entry.name) ? [full] : [];
  });
}

describe("prepared query names", () => {
  it("are unique across the app's sources", () => {
    const declared = ROOTS.flatMap((root) => sources(root)).flatMap((file) =>
      [...readFileSync(file, "utf8").matchAll(/\bprepared\(\s*"([^"]+)"/g)].map((m) => ({ name: m[1]!, file })),
    );
    // The scan finds the detail page's queries at least (db/queries/review.ts).
    expect(declared.map((d) => d.name)).toContain("request_row");
    const seen = new Map<string, string>();
    const clashes = declared.filter((d) => {
      const first = seen.get(d.name);
      seen.set(d.name, first ?? d.file);
      return first !== undefined;
    });
    expect(clashes).toEqual([]);
  });
});
