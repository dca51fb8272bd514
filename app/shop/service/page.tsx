import type { Metadata } from "next";
import Link from "next/link";
import { DueSoonTable } from "@/components/service/due-soon-table";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { listDueSoon } from "@/lib/service/due-soon";

export const metadata: Metadata = { title: "Due soon" };
export const dynamic = "force-dynamic";

export default async function DueSoonPage() {
  const user = await requireRole(STAFF_ROLES, { page: "/shop/service" });
  const { items, noticeDays, timeZone } = await listDueSoon();
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Due soon</h1>
      <p className="text-stone-700">
        Services overdue or due within {noticeDays} days, from each approved setup, the hours riders log and their hours
        per month (dates on the shop&apos;s calendar, {timeZone}). Riders get one reminder e-mail per service and due
        date from the daily job.
        {user.role === "admin" ? (
          <>
            {" "}
            <Link href="/shop/settings/service" className="text-pine-700 underline">
              Change the intervals and notice period
            </Link>
            .
          </>
        ) : null}
      </p>
      <DueSoonTable items={items} />
    </div>
  );
}
