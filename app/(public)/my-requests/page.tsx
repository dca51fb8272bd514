import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { StatusBadge } from "@/components/ui/status-badge";
import { listRequestsForRiderEmail } from "@/db/queries/requests";
import { requireSession } from "@/lib/auth/guard";
import { STATUS_NEXT_STEP } from "@/lib/requests/status";
import { formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "My requests" };
export const dynamic = "force-dynamic";

export default async function MyRequestsPage() {
  // Any signed-in person sees only the requests made with their own e-mail address.
  const user = await requireSession({ page: "/my-requests" });
  const requests = await listRequestsForRiderEmail(user.email);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold">My requests</h1>
      <p className="text-stone-700">Signed in as {user.email}.</p>
      {requests.length === 0 ? (
        <p className="rounded-xl border border-stone-200 bg-white p-4">
          No setup requests were made with this e-mail address yet.
        </p>
      ) : (
        <ul className="flex flex-col gap-3">
          {requests.map((r) => (
            <li key={r.id} className="rounded-xl border border-stone-200 bg-white p-4">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <Link
                  href={`/my-requests/${r.id}`}
                  className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline"
                >
                  Request {r.number} · {r.bikeLabel}
                </Link>
                <StatusBadge status={r.status} />
              </div>
              <p className="mt-1 text-sm text-stone-600">
                Sent {formatDay(r.createdAt)} · {STATUS_NEXT_STEP[r.status]}
              </p>
            </li>
          ))}
        </ul>
      )}
      <div className="flex flex-wrap gap-3">
        <Link href="/request" className={buttonClass("primary")}>
          Ask for another setup
        </Link>
        <Link href="/" className={buttonClass("secondary")}>
          Back to the start
        </Link>
      </div>
    </div>
  );
}
