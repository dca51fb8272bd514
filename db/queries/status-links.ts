import { and, eq } from "drizzle-orm";
import { getDb, type AppDb } from "@/db/client";
import { setupRequests, statusLinks } from "@/db/schema";
import { hashStatusToken, newStatusToken } from "@/lib/requests/token";

type Executor = Pick<AppDb, "insert">;

/** Stores a new status link for the request and returns its token (shown once, never stored). */
export async function createStatusLink(requestId: string, executor?: Executor, token = newStatusToken()) {
  const db = executor ?? (await getDb());
  await db
    .insert(statusLinks)
    .values({ requestId, tokenHash: hashStatusToken(token) })
    .onConflictDoNothing();
  return token;
}

/** The request a status-link token opens, or null. */
export async function findRequestIdByStatusToken(token: string): Promise<string | null> {
  if (token.length < 20 || token.length > 200) return null;
  const db = await getDb();
  const rows = await db
    .select({ requestId: statusLinks.requestId })
    .from(statusLinks)
    .where(eq(statusLinks.tokenHash, hashStatusToken(token)))
    .limit(1);
  return rows[0]?.requestId ?? null;
}

/** True when the token opens exactly this request. */
export async function statusTokenOpens(token: string, requestId: string): Promise<boolean> {
  const db = await getDb();
  const rows = await db
    .select({ id: statusLinks.id })
    .from(statusLinks)
    .innerJoin(setupRequests, eq(setupRequests.id, statusLinks.requestId))
    .where(and(eq(statusLinks.tokenHash, hashStatusToken(token)), eq(statusLinks.requestId, requestId)))
    .limit(1);
  return rows.length > 0;
}
