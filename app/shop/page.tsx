import type { Metadata } from "next";
import { StatusBadge } from "@/components/ui/status-badge";
import { countRequestsByStatus, listRecentRequests } from "@/db/queries/requests";
import { REQUEST_STATUSES } from "@/db/schema";
import { STATUS_LABELS } from "@/lib/requests/status";

export const metadata: Metadata = { title: "Queue" };
export const dynamic = "force-dynamic";

export default async function QueuePage() {
  const [counts, recent] = await Promise.all([countRequestsByStatus(), listRecentRequests(25)]);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold">Setup requests</h1>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-5" aria-label="Requests per status">
        {REQUEST_STATUSES.map((status) => (
          <li key={status} className="rounded-xl border border-stone-200 bg-white p-3">
            <p className="text-sm text-stone-600">{STATUS_LABELS[status]}</p>
            <p className="text-2xl font-bold tabular-nums">{counts[status]}</p>
          </li>
        ))}
      </ul>
      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Newest setup requests</caption>
          <thead className="bg-stone-100 text-stone-700">
            <tr>
              <th scope="col" className="px-3 py-2">No.</th>
              <th scope="col" className="px-3 py-2">Rider</th>
              <th scope="col" className="px-3 py-2">Bike</th>
              <th scope="col" className="px-3 py-2">Discipline</th>
              <th scope="col" className="px-3 py-2">Status</th>
              <th scope="col" className="px-3 py-2">Received</th>
            </tr>
          </thead>
          <tbody>
            {recent.map((r) => (
              <tr key={r.id} className="border-t border-stone-100">
                <td className="px-3 py-2 tabular-nums">{r.number}</td>
                <td className="px-3 py-2">{r.riderName}</td>
                <td className="px-3 py-2">{r.bikeLabel}</td>
                <td className="px-3 py-2 capitalize">{r.discipline}</td>
                <td className="px-3 py-2"><StatusBadge status={r.status} /></td>
                <td className="px-3 py-2">{r.createdAt.toISOString().slice(0, 10)}</td>
              </tr>
            ))}
            {recent.length === 0 ? (
              <tr>
                <td colSpan={6} className="px-3 py-6 text-center text-stone-600">No requests yet.</td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
