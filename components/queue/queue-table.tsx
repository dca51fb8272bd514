"use client";

// The queue table (TanStack Table). Sorting and paging happen on the server: the table only maps
// its sorting state to the API's `sort` parameter.
import { STAFF_NOTICE_LABELS, disciplineLabel } from "@/lib/labels";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { StatusBadge } from "@/components/ui/status-badge";
import type { QueueRow } from "./queue-data";
import { formatDay } from "@/lib/format";
import { ScrollBox } from "@/components/ui/scroll-box";
import { cn } from "@/components/ui/cn";
import type { QueueSort } from "@/lib/validations/queue";

const SORT_OF: Record<string, { asc: string; desc: string }> = {
  number: { asc: "number_asc", desc: "number" },
  riderName: { asc: "rider", desc: "rider_desc" },
  // Ascending is the workflow's order (submitted first), descending its reverse.
  status: { asc: "status", desc: "status_desc" },
  createdAt: { asc: "oldest", desc: "newest" },
};

export function sortingFrom(sort: string): SortingState {
  for (const [id, s] of Object.entries(SORT_OF)) {
    if (s.desc === sort) return [{ id, desc: true }];
    if (s.asc === sort) return [{ id, desc: false }];
  }
  return [{ id: "createdAt", desc: true }];
}

export function sortFrom(sorting: SortingState): string {
  const first = sorting[0];
  if (!first) return "newest";
  const s = SORT_OF[first.id];
  return s ? (first.desc ? s.desc : s.asc) : "newest";
}

const col = createColumnHelper<QueueRow>();

/** Columns shown from the small breakpoint up; a phone keeps number, rider and status side by side. */
const WIDE_ONLY = new Set(["bikeLabel", "discipline", "assignedTunerName", "createdAt"]);
const cellClass = (id: string) => (WIDE_ONLY.has(id) ? "hidden sm:table-cell" : "");

/** The order the list is in, in words, for the table's caption. */
const SORT_WORDS: Record<QueueSort, string> = {
  newest: "newest first",
  oldest: "oldest first",
  number: "number, highest first",
  number_asc: "number, lowest first",
  rider: "rider, A to Z",
  rider_desc: "rider, Z to A",
  status: "status, in workflow order",
  status_desc: "status, in reverse workflow order",
};

const columns = [
  col.accessor("number", { header: "No.", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
  col.accessor("riderName", {
    header: "Rider",
    cell: (c) => (
      <div className="flex flex-col">
        <Link
          href={`/shop/requests/${c.row.original.id}`}
          className="font-medium text-pine-700 underline underline-offset-2 hover:text-pine-900"
        >
          {c.getValue()}
        </Link>
        <span className="text-xs break-all text-stone-600 sm:break-normal">{c.row.original.riderEmail}</span>
        {/* On a phone the bike and the day received ride along here; their own columns are wide-screen only. */}
        <span className="text-xs text-stone-700 sm:hidden">
          {c.row.original.bikeLabel} · received {formatDay(c.row.original.createdAt)}
        </span>
        {c.row.original.notices?.length ? (
          <span className="mt-1 flex flex-wrap gap-1">
            {c.row.original.notices.map((k) => (
              <span
                key={k}
                className="rounded-full bg-amber-100 px-2 py-0.5 text-xs font-semibold text-amber-950 ring-1 ring-amber-400"
              >
                {STAFF_NOTICE_LABELS[k]}
              </span>
            ))}
          </span>
        ) : null}
      </div>
    ),
  }),
  col.accessor("bikeLabel", { header: "Bike", enableSorting: false }),
  col.accessor("discipline", {
    header: "Discipline",
    enableSorting: false,
    cell: (c) => disciplineLabel(c.getValue()),
  }),
  col.accessor("assignedTunerName", {
    header: "Tuner",
    enableSorting: false,
    cell: (c) => c.getValue() ?? <span className="text-stone-500">Not assigned</span>,
  }),
  col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
  col.accessor("createdAt", { header: "Received", cell: (c) => formatDay(c.getValue()) }),
];

export function QueueTable({
  rows,
  sort,
  onSort,
  busy,
}: {
  rows: QueueRow[];
  sort: string;
  onSort: (sort: string) => void;
  busy: boolean;
}) {
  const sorting = sortingFrom(sort);
  // TanStack Table is not compatible with the React Compiler's memoization; the compiler skips this
  // component on purpose (the table is small: one page of rows).
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => onSort(sortFrom(typeof updater === "function" ? updater(sorting) : updater)),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => r.id,
  });
  return (
    <ScrollBox label="Setup requests" className="rounded-xl border border-stone-200 bg-white" aria-busy={busy}>
      <table className="w-full text-left text-sm">
        <caption className="sr-only">
          Setup requests, sorted by {SORT_WORDS[sort as QueueSort] ?? SORT_WORDS.newest}
        </caption>
        <thead className="bg-stone-100 text-stone-700">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => {
                const dir = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    scope="col"
                    className={cn("px-3 py-2", cellClass(h.column.id))}
                    aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : undefined}
                  >
                    {h.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={h.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 items-center gap-1 font-semibold hover:text-pine-800"
                      >
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true">{dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}</span>
                        <span className="sr-only">
                          {dir ? `(sorted ${dir === "asc" ? "ascending" : "descending"})` : "(sort)"}
                        </span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-stone-100 hover:bg-pine-50">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={cn("px-3 py-2 align-top", cellClass(cell.column.id))}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {rows.length === 0 && !busy ? (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-stone-600">
                No requests match these filters.
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </ScrollBox>
  );
}
