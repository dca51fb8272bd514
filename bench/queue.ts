// Queue benchmark: latency of the staff queue's list (GET /api/requests → listQueue) with 100 and
// with 10,000 requests in an in-memory PGlite, for the query shapes the workspace uses, printed as
// the ratio 10,000 / 100. Indexes keep it far below the 100× a full scan would cost; a search whose
// trigrams every row shares ("rider …") is the least selective shape. Prints only; shared machines are
// noisy, so read the ratios, not the milliseconds.
// Run: npx tsx bench/queue.ts
import { drizzle } from "drizzle-orm/pglite";
import { installTestDatabase, closeDatabase, type DatabaseHandle } from "../db/client";
import { applyMigrations } from "../db/migrate";
import { createPglite } from "../db/pglite";
import { listQueue } from "../db/queries/requests";
import * as schema from "../db/schema";
import { setupRequests } from "../db/schema";
import { vacuumEmbeddedDatabase } from "../db/upkeep";
import { queueQuerySchema } from "../lib/validations/queue";

const STATUSES = ["submitted", "in_review", "waiting_for_rider", "approved", "declined"] as const;
const DISCIPLINES = ["motocross", "enduro", "supercross", "trail", "desert", "cross-country"];
const SHAPES: Record<string, Record<string, string>> = {
  "newest, page 1": {},
  "status in_review": { status: "in_review" },
  "discipline + class": { discipline: "enduro", bikeClass: "class-2" },
  "search 'rider 0042'": { q: "rider 0042" },
  "search 'rider 0004'": { q: "rider 0004" },
  "page 40 of newest": { page: "40" },
};

async function insert(from: number, to: number) {
  const db = (await import("../db/client")).getDb;
  const d = await db();
  for (let start = from; start < to; start += 1000) {
    const rows = [];
    for (let i = start; i < Math.min(to, start + 1000); i++)
      rows.push({
        status: STATUSES[i % 5]!,
        riderName: `Rider ${String(i).padStart(5, "0")}`,
        riderEmail: `rider${i}@bench.test`,
        discipline: DISCIPLINES[i % DISCIPLINES.length]!,
        skill: "intermediate",
        bikeClass: `class-${i % 4}`,
        bikeLabel: `Bench class ${i % 4} (typical)`,
        riderMassKg: 70,
        answers: {},
        createdAt: new Date(Date.UTC(2024, 0, 1) + ((i * 7919) % 100_000) * 60_000),
      });
    await d.insert(setupRequests).values(rows);
  }
  // As the app keeps its embedded database: vacuumed, so index-only scans work.
  await vacuumEmbeddedDatabase();
}

/** Median ms per shape; the shapes take turns, so a slow spell of the machine hits them alike. */
async function measure(): Promise<Record<string, number>> {
  const queries = Object.entries(SHAPES).map(([name, params]) => [name, queueQuerySchema.parse(params)] as const);
  for (let i = 0; i < 40; i++) for (const [, query] of queries) await listQueue(query); // warm-up (JIT, plan cache)
  const times = new Map<string, number[]>(queries.map(([name]) => [name, []]));
  for (let i = 0; i < 150; i++)
    for (const [name, query] of queries) {
      const t = performance.now();
      await listQueue(query);
      times.get(name)!.push(performance.now() - t);
    }
  const out: Record<string, number> = {};
  for (const [name, list] of times) out[name] = list.sort((a, b) => a - b)[Math.floor(list.length / 2)]!;
  return out;
}

const client = await createPglite();
const handle: DatabaseHandle = {
  db: drizzle({ client, schema }) as unknown as DatabaseHandle["db"],
  kind: "pglite",
  close: () => client.close(),
};
await applyMigrations(handle);
installTestDatabase(handle);

await insert(0, 100);
const small = await measure();
await insert(100, 10_000);
const large = await measure();
console.log(`${"query".padEnd(22)} ${"100 rows".padStart(10)} ${"10,000 rows".padStart(12)} ${"ratio".padStart(7)}`);
for (const name of Object.keys(SHAPES))
  console.log(
    `${name.padEnd(22)} ${small[name]!.toFixed(2).padStart(8)}ms ${large[name]!.toFixed(2).padStart(10)}ms ${(large[name]! / small[name]!).toFixed(1).padStart(6)}×`,
  );
// With 100 rows page 40 is empty and 'rider 0042' finds nothing (it matches riders 00420-00429), so
// their ratios also count the work of filling a page; 'rider 0004' finds the same 10 riders
// (00040-00049) in both, and page 40 against page 1 of the same 10,000 rows shows what the depth
// alone costs.
console.log(
  `page 40 against page 1 at 10,000 rows: ${(large["page 40 of newest"]! / large["newest, page 1"]!).toFixed(2)}×`,
);
await closeDatabase();
