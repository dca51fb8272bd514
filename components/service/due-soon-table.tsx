// Who is due for a service: rider, bike, what, when, and the shop's last e-mail to them.
import Link from "next/link";
import { cn } from "@/components/ui/cn";
import { formatDateTime, formatDay } from "@/lib/format";
import type { DueSoonRow } from "@/lib/service/types";
import { ScrollBox } from "@/components/ui/scroll-box";

const civilDay = (day: string) => formatDay(`${day}T00:00:00Z`);

export function DueSoonTable({ items }: { items: DueSoonRow[] }) {
  if (!items.length)
    return (
      <p className="rounded-xl border border-stone-200 bg-white p-4">No service is due within the notice period.</p>
    );
  return (
    <ScrollBox label="Services due" className="rounded-xl border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Services due soon or overdue</caption>
        <thead className="bg-stone-50 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              Rider
            </th>
            <th scope="col" className="px-3 py-2">
              Bike
            </th>
            <th scope="col" className="px-3 py-2">
              Service
            </th>
            <th scope="col" className="px-3 py-2">
              Due
            </th>
            <th scope="col" className="px-3 py-2">
              Last contact
            </th>
          </tr>
        </thead>
        <tbody>
          {items.map((row) => (
            <tr key={`${row.requestId}:${row.item}`} className="border-t border-stone-100">
              <td className="px-3 py-2">
                <Link href={`/shop/requests/${row.requestId}`} className="font-semibold text-pine-700 underline">
                  {row.riderName}
                </Link>
                <span className="block text-stone-600">
                  Request {row.number} · {row.riderEmail}
                </span>
              </td>
              <td className="px-3 py-2">{row.bikeLabel}</td>
              <td className="px-3 py-2">{row.label}</td>
              <td className="px-3 py-2">
                <span className={cn("font-medium", row.state === "overdue" ? "text-red-800" : "text-amber-900")}>
                  {row.state === "overdue" ? "Overdue since " : ""}
                  {civilDay(row.dueOn)}
                </span>
              </td>
              <td className="px-3 py-2">{row.lastContact ? formatDateTime(row.lastContact) : "Never e-mailed"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
