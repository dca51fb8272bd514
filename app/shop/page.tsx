import type { Metadata } from "next";
import { BIKE_CLASS_LABELS } from "@/lib/labels";
import { Suspense } from "react";
import { QueueView } from "@/components/queue/queue-view";
import { listBikeClassOptions, listStaffMembers } from "@/db/queries/review";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import Loading from "./loading";

export const metadata: Metadata = { title: "Queue" };
export const dynamic = "force-dynamic";

export default async function QueuePage() {
  await requireRole(STAFF_ROLES, { page: "/shop" });
  const [bikeClasses, staff] = await Promise.all([listBikeClassOptions(), listStaffMembers()]);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold">Setup requests</h1>
      <Suspense fallback={<Loading />}>
        <QueueView
          options={{
            bikeClasses: bikeClasses.map((b) => ({ value: b.value, label: BIKE_CLASS_LABELS[b.value] ?? b.label })),
            tuners: staff.map(({ id, name }) => ({ id, name })),
          }}
        />
      </Suspense>
    </div>
  );
}
