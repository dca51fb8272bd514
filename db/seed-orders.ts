// Demo orders (invented, like the rest of the demo shop): order settings, a price list, two outside
// finishers, and orders on the approved demo requests in every workshop stage, one with a part
// overdue at a finisher. Stable ids and "do nothing on conflict" keep a second run from changing anything.
import { eq } from "drizzle-orm";
import type { AppDb } from "@/db/client";
import {
  finisherJobs,
  finishers,
  orderEvents,
  orderLines,
  orders,
  orderSettings,
  payments,
  priceItems,
  user,
} from "@/db/schema";
import { isoDay } from "@/lib/format";
import { orderTotals } from "@/lib/orders/money";
import { sheetLines } from "@/lib/orders/service";
import { ORDER_STAGES, type OrderStage, type ServiceType } from "@/lib/orders/stages";
import { stableUuid } from "./seed-data";

const DEMO_PRICES = [
  { code: "service-send-in", label: "Fork and shock rebuild (send-in)", kind: "service", unitPriceMinor: 24000 },
  { code: "service-kit", label: "Kit built to order", kind: "service", unitPriceMinor: 9000 },
  { code: "service-springs-only", label: "Spring selection and packing", kind: "service", unitPriceMinor: 1500 },
  { code: "spring-fork", label: "Fork spring", kind: "spring", unitPriceMinor: 6200 },
  { code: "spring-shock", label: "Shock spring", kind: "spring", unitPriceMinor: 11500 },
  { code: "seal-kit-fork", label: "Fork seal and bushing kit", kind: "part", unitPriceMinor: 4800 },
  { code: "shipping-return", label: "Return shipping", kind: "shipping", unitPriceMinor: 1800 },
] as const;

const DEMO_FINISHERS = [
  { key: "coat", name: "Ridgeback Coatings (demo)", work: "Hard coating of fork tubes", turnaroundDays: 10 },
  {
    key: "polish",
    name: "Millpond Polishing (demo)",
    work: "Polishing of shock shafts and springs",
    turnaroundDays: 5,
  },
] as const;

const DAY = 86_400_000;

// Which demo request carries which order, its service and stage, and how many days ago it started.
// The shipped and closed orders sit on two 125-class riders approved weeks ago (db/seed-data.ts),
// shipped after their approval: a ship date restarts the service clock (lib/service/overview.ts), so
// the service scenario of db/seed-service.ts (r09, r10, r11) stays as its comment says.
const DEMO_ORDERS: {
  key: string;
  request: string;
  serviceType: ServiceType;
  stage: OrderStage;
  daysAgo: number;
  shippedDaysAgo?: number;
}[] = [
  { key: "o1", request: "r10", serviceType: "send-in", stage: "awaiting_parts", daysAgo: 2 },
  { key: "o2", request: "r11", serviceType: "send-in", stage: "received", daysAgo: 4 },
  { key: "o3", request: "r09", serviceType: "kit", stage: "in_work", daysAgo: 6 },
  { key: "o4", request: "r10", serviceType: "send-in", stage: "at_finisher", daysAgo: 20 },
  { key: "o5", request: "r11", serviceType: "kit", stage: "assembled", daysAgo: 12 },
  { key: "o6", request: "c04", serviceType: "springs-only", stage: "shipped", daysAgo: 9, shippedDaysAgo: 2 },
  { key: "o7", request: "c05", serviceType: "springs-only", stage: "closed", daysAgo: 40, shippedDaysAgo: 33 },
];

export async function seedOrders(db: AppDb): Promise<void> {
  await db.insert(orderSettings).values({ id: 1, currency: "EUR", taxRateBp: 2000 }).onConflictDoNothing();
  for (const [i, item] of DEMO_PRICES.entries())
    await db
      .insert(priceItems)
      .values({ id: stableUuid(`price:${item.code}`), ...item, sortOrder: i })
      .onConflictDoNothing();
  for (const f of DEMO_FINISHERS)
    await db
      .insert(finishers)
      .values({ id: stableUuid(`finisher:${f.key}`), name: f.name, work: f.work, turnaroundDays: f.turnaroundDays })
      .onConflictDoNothing();

  const [tuner] = await db.select({ id: user.id }).from(user).where(eq(user.email, "tuner@sagwise.test"));
  const now = Date.now();
  for (const demo of DEMO_ORDERS) {
    const id = stableUuid(`order:${demo.key}`);
    if ((await db.select({ id: orders.id }).from(orders).where(eq(orders.id, id))).length) continue;
    const requestId = stableUuid(`request:${demo.request}`);
    const started = new Date(now - demo.daysAgo * DAY);
    await db.transaction(async (tx) => {
      const { versionId, lines } = await sheetLines(requestId, demo.serviceType, tx);
      const totals = orderTotals(lines, 2000);
      const reached = ORDER_STAGES.slice(0, ORDER_STAGES.indexOf(demo.stage) + 1).filter(
        (s) => demo.serviceType === "send-in" || s !== "received",
      );
      const paid = demo.stage !== "awaiting_parts";
      const shipped = demo.stage === "shipped" || demo.stage === "closed";
      await tx.insert(orders).values({
        id,
        requestId,
        versionId,
        serviceType: demo.serviceType,
        stage: demo.stage,
        currency: "EUR",
        taxRateBp: 2000,
        acceptedAt: started,
        paidMinor: paid ? totals.totalMinor : 0,
        paymentStatus: paid ? "paid" : "unpaid",
        assignedTunerId: tuner?.id ?? null,
        dueOn: isoDay(started.getTime() + 21 * DAY),
        checkIn: reached.includes("received")
          ? {
              serials: [{ part: "Shock", serial: `DEMO-${demo.key.toUpperCase()}-S1` }],
              conditionNotes: "Demo: shaft clean, fork seals weeping on the left leg.",
              checkedInAt: new Date(started.getTime() + DAY).toISOString(),
              checkedInBy: "Teo Brambleton",
            }
          : null,
        carrier: shipped ? "Demo Parcel Service" : null,
        trackingNumber: shipped ? `DEMO${demo.key.toUpperCase()}0042` : null,
        shippedAt: shipped ? new Date(now - (demo.shippedDaysAgo ?? 2) * DAY) : null,
        createdAt: started,
      });
      await tx.insert(orderLines).values(lines.map((l, i) => ({ ...l, orderId: id, sortOrder: i })));
      for (const [i, stage] of reached.entries())
        await tx.insert(orderEvents).values({
          orderId: id,
          fromStage: i === 0 ? null : reached[i - 1]!,
          toStage: stage,
          actorLabel: i === 0 ? "rider" : "Teo Brambleton",
          createdAt: new Date(started.getTime() + i * DAY),
        });
      if (paid)
        await tx.insert(payments).values({
          orderId: id,
          kind: "charge",
          status: "paid",
          amountMinor: totals.totalMinor,
          currency: "EUR",
          providerSessionId: `cs_demo_${demo.key}`,
          providerPaymentIntentId: `pi_demo_${demo.key}`,
          paidAt: started,
        });
      if (demo.stage === "at_finisher")
        // The demo's overdue part: sent 14 days ago on a 10-day turnaround, so 4 days late.
        await tx.insert(finisherJobs).values({
          orderId: id,
          finisherId: stableUuid("finisher:coat"),
          part: "Fork tubes (pair)",
          sentOn: isoDay(now - 14 * DAY),
          dueOn: isoDay(now - 4 * DAY),
        });
    });
  }
}
