// Prepared queries (db/prepared.ts) are kept per database: after the app is handed another database
// (as each test file, script or a restart does), the same function reads that one, never the
// database it was first prepared on.
import { afterAll, describe, expect, it } from "vitest";
import { closeDatabase, installTestDatabase, type DatabaseHandle } from "@/db/client";
import { isNull } from "drizzle-orm";
import { countUnseenNotices, listUnseenNoticeKinds } from "@/db/queries/notices";
import { getRequestRow, listStaffMembers } from "@/db/queries/review";
import { setupRequests, staffNotices } from "@/db/schema";
import { seedDemo } from "@/db/seed-demo";
import { createTestDatabase } from "../helpers/db";

const opened: DatabaseHandle[] = [];

afterAll(async () => {
  await closeDatabase();
  for (const handle of opened.slice(0, -1)) await handle.close();
});

describe("prepared queries", () => {
  it("read the database the app has now, not the first one they ran on", async () => {
    const seeded = await createTestDatabase();
    opened.push(seeded);
    await seedDemo();
    const [request] = await seeded.db.select({ id: setupRequests.id }).from(setupRequests).limit(1);
    const seededNotices = await countUnseenNotices();
    const seededStaff = await listStaffMembers();
    expect(seededNotices.total).toBeGreaterThan(0);
    expect(seededStaff.length).toBeGreaterThan(0);
    expect(await getRequestRow(request!.id)).not.toBeNull();

    // A migrated database with no rows at all.
    const empty = await createTestDatabase();
    opened.push(empty);
    expect((await countUnseenNotices()).total).toBe(0);
    expect(await listStaffMembers()).toEqual([]);
    expect(await getRequestRow(request!.id)).toBeNull();

    // And back: the first database's rows again, through the same functions.
    installTestDatabase(seeded);
    expect(await countUnseenNotices()).toEqual(seededNotices);
    expect(await listStaffMembers()).toEqual(seededStaff);
    expect((await getRequestRow(request!.id))?.request.id).toBe(request!.id);
    installTestDatabase(empty);
  });

  it("mark a queue page's unseen notices for any number of ids, given as one array parameter", async () => {
    const seeded = await createTestDatabase();
    opened.push(seeded);
    await seedDemo();
    const unseen = await seeded.db
      .selectDistinct({ requestId: staffNotices.requestId, kind: staffNotices.kind })
      .from(staffNotices)
      .where(isNull(staffNotices.seenAt));
    expect(unseen.length).toBeGreaterThan(0);
    const ids = (await seeded.db.select({ id: setupRequests.id }).from(setupRequests)).map((r) => r.id);
    const expected = (list: string[]) =>
      Object.fromEntries(
        list
          .map(
            (id) =>
              [
                id,
                unseen
                  .filter((n) => n.requestId === id)
                  .map((n) => n.kind)
                  .sort(),
              ] as const,
          )
          .filter(([, kinds]) => kinds.length > 0),
      );
    const read = async (list: string[]) =>
      Object.fromEntries([...(await listUnseenNoticeKinds(list))].map(([id, kinds]) => [id, [...kinds].sort()]));

    expect(await read(ids)).toEqual(expected(ids));
    const one = unseen[0]!.requestId;
    expect(await read([one])).toEqual(expected([one]));
    // An id of no request marks nothing, and the others in the list still come back.
    expect(await read(["00000000-0000-4000-8000-000000000000", one])).toEqual(expected([one]));
    expect((await listUnseenNoticeKinds([])).size).toBe(0);
  });
});
