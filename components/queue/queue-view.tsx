"use client";

// The staff queue: filters live in the URL (shareable, back button works), data comes from
// GET /api/requests through TanStack Query and refreshes every 15 s so new requests appear.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { usePathname, useSearchParams } from "next/navigation";
import { useCallback } from "react";
import { Button } from "@/components/ui/button";
import { fetchQueue, filtersFrom, paramsFrom, type QueueFilters } from "./queue-data";
import { QueueFiltersForm, type FilterOptions } from "./queue-filters";
import { QueueTable } from "./queue-table";
import { StatusCounts } from "./status-counts";

export const QUEUE_REFRESH_MS = 15_000;

export function QueueView({ options }: { options: FilterOptions }) {
  const pathname = usePathname();
  const searchParams = useSearchParams();
  const filters = filtersFrom(new URLSearchParams(searchParams.toString()));

  const query = useQuery({
    queryKey: ["queue", paramsFrom(filters).toString()],
    queryFn: () => fetchQueue(filters),
    placeholderData: keepPreviousData,
    refetchInterval: QUEUE_REFRESH_MS,
  });

  // The filters change only the URL: the page's server part does not read them, so the browser's
  // own history.replaceState (which Next.js's router follows, useSearchParams included) updates
  // them at once, with no server render of the page before the list's request can start. Built on
  // the address as it is now, so two changes in quick succession both stay.
  const update = useCallback(
    (patch: Partial<QueueFilters>) => {
      const current = filtersFrom(new URLSearchParams(window.location.search));
      // Any change other than the page itself starts again at page 1.
      const next = { ...current, ...patch, page: patch.page ?? 1 };
      const qs = paramsFrom(next).toString();
      window.history.replaceState(null, "", qs ? `${pathname}?${qs}` : pathname);
    },
    [pathname],
  );

  const total = query.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / filters.pageSize));
  const first = total === 0 ? 0 : (filters.page - 1) * filters.pageSize + 1;
  const last = Math.min(total, filters.page * filters.pageSize);

  return (
    <div className="flex flex-col gap-6">
      <StatusCounts counts={query.data?.counts} active={filters.status} onPick={(status) => update({ status })} />
      <QueueFiltersForm filters={filters} options={options} onChange={update} />
      {query.isError ? (
        <div role="alert" className="rounded-xl border border-red-200 bg-red-50 p-4 text-red-900">
          {query.error.message}{" "}
          <Button variant="secondary" className="ml-2" onClick={() => query.refetch()}>
            Try again
          </Button>
        </div>
      ) : null}
      <p className="text-sm text-stone-700" aria-live="polite">
        {query.isPending ? "Loading requests…" : `${first}–${last} of ${total} requests`}
        {query.isFetching && !query.isPending ? " (updating…)" : ""}
      </p>
      <QueueTable
        rows={query.data?.items ?? []}
        sort={filters.sort}
        onSort={(sort) => update({ sort })}
        busy={query.isFetching}
      />
      <nav aria-label="Pages" className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" disabled={filters.page <= 1} onClick={() => update({ page: filters.page - 1 })}>
          Previous page
        </Button>
        <span className="text-sm tabular-nums">
          Page {Math.min(filters.page, pages)} of {pages}
        </span>
        <Button variant="secondary" disabled={filters.page >= pages} onClick={() => update({ page: filters.page + 1 })}>
          Next page
        </Button>
        <label className="ml-auto flex items-center gap-2 text-sm">
          Rows per page
          <select
            value={filters.pageSize}
            onChange={(e) => update({ pageSize: Number(e.target.value) })}
            className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
          >
            {[10, 25, 50, 100].map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
      </nav>
    </div>
  );
}
