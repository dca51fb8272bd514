// Demo notices to the shop (db/tables/notices.ts): the new requests nobody has started and the
// newest sag report, unseen, so the demo's navigation count and queue marks show something. Invented
// like the rest of the demo; fixed ids, so seeding again changes nothing.
import { sql } from "drizzle-orm";
import type { AppDb } from "@/db/client";
import { staffNotices, type StaffNoticeKind } from "@/db/schema";
import { DEMO_REQUESTS, DEMO_SHOP, stableUuid } from "./seed-data";

export async function seedNotices(db: AppDb): Promise<void> {
  const notices: { key: string; kind: StaffNoticeKind; to: string }[] = [
    ...DEMO_REQUESTS.filter((r) => r.status === "submitted").map((r) => ({
      key: r.key,
      kind: "new-request" as const,
      to: r.tuner ?? DEMO_SHOP.email,
    })),
    ...DEMO_REQUESTS.filter((r) => r.sagReportDaysAfter !== undefined)
      .slice(-1)
      .map((r) => ({ key: r.key, kind: "sag-reported" as const, to: r.tuner ?? DEMO_SHOP.email })),
  ];
  if (!notices.length) return;
  await db
    .insert(staffNotices)
    .values(
      notices.map((n) => ({
        id: stableUuid(`notice:${n.key}:${n.kind}`),
        requestId: stableUuid(`request:${n.key}`),
        kind: n.kind,
        toAddress: n.to,
        createdAt: sql`now()`,
      })),
    )
    .onConflictDoNothing();
}
