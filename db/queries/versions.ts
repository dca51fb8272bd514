// Recommendation versions of a request: the newest is the one a tuner edits; approved ones are frozen.
import { and, asc, desc, eq, ne, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { getDb, type AppDb } from "@/db/client";
import { prepared } from "@/db/prepared";
import { recommendationVersions, user } from "@/db/schema";

type Reader = Pick<AppDb, "select">;

export type VersionRow = typeof recommendationVersions.$inferSelect;

/** The newest version (highest number), or null when the request has none yet. */
export async function getLatestVersion(requestId: string, executor?: Reader): Promise<VersionRow | null> {
  const db = executor ?? (await getDb());
  const [row] = await db
    .select()
    .from(recommendationVersions)
    .where(eq(recommendationVersions.requestId, requestId))
    .orderBy(desc(recommendationVersions.version))
    .limit(1);
  return row ?? null;
}

/** Whether any version before this one was ever approved (a later approval is then a revision). */
export async function hasEarlierApproval(requestId: string, version: number, executor?: Reader): Promise<boolean> {
  const db = executor ?? (await getDb());
  const rows = await db
    .select({ id: recommendationVersions.id })
    .from(recommendationVersions)
    .where(
      and(
        eq(recommendationVersions.requestId, requestId),
        ne(recommendationVersions.version, version),
        ne(recommendationVersions.state, "draft"),
      ),
    )
    .limit(1);
  return rows.length > 0;
}

const creator = alias(user, "creator");
const approver = alias(user, "approver");

const versionList = prepared("request_versions", (db, name) =>
  db
    .select({
      id: recommendationVersions.id,
      version: recommendationVersions.version,
      state: recommendationVersions.state,
      engineVersion: recommendationVersions.engineVersion,
      input: recommendationVersions.input,
      output: recommendationVersions.output,
      overrides: recommendationVersions.overrides,
      notesForRider: recommendationVersions.notesForRider,
      internalNotes: recommendationVersions.internalNotes,
      createdAt: recommendationVersions.createdAt,
      updatedAt: recommendationVersions.updatedAt,
      approvedAt: recommendationVersions.approvedAt,
      createdByName: creator.name,
      approvedByName: approver.name,
    })
    .from(recommendationVersions)
    .leftJoin(creator, eq(creator.id, recommendationVersions.createdById))
    .leftJoin(approver, eq(approver.id, recommendationVersions.approvedById))
    .where(eq(recommendationVersions.requestId, sql.placeholder("id")))
    .orderBy(asc(recommendationVersions.version))
    .prepare(name),
);

/** Every version, oldest first, with who made and who approved it. */
export async function listVersions(requestId: string) {
  return versionList(await getDb()).execute({ id: requestId });
}

export type VersionListItem = Awaited<ReturnType<typeof listVersions>>[number];
