"use client";

// The catalog list: sortable columns (TanStack Table); search and the retired filter are server-side.
import { bikeClassLabel } from "@/lib/labels";
import Link from "next/link";
import { useState } from "react";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { FORK_KIND_LABELS } from "./bike-fields";
import { ScrollBox } from "@/components/ui/scroll-box";

export interface CatalogRow {
  id: string;
  name: string;
  bikeClass: string;
  forkKind: string;
  rearWheelTravelMm: number;
  isTypical: boolean;
  retired: boolean;
}

const col = createColumnHelper<CatalogRow>();
const columns = [
  col.accessor("name", {
    header: "Model",
    cell: (c) => (
      <span className="flex flex-wrap items-center gap-2">
        <Link href={`/shop/catalog/${c.row.original.id}`} className="font-medium text-pine-700 underline">
          {c.getValue()}
        </Link>
        {c.row.original.isTypical ? (
          <span className="rounded bg-amber-soft px-2 text-xs text-stone-800">typical values</span>
        ) : null}
        {c.row.original.retired ? (
          <span className="rounded bg-stone-200 px-2 text-xs text-stone-800">retired</span>
        ) : null}
      </span>
    ),
  }),
  col.accessor("bikeClass", { header: "Class", cell: (c) => bikeClassLabel(c.getValue()) }),
  col.accessor("forkKind", {
    header: "Fork",
    cell: (c) => FORK_KIND_LABELS[c.getValue() as keyof typeof FORK_KIND_LABELS] ?? c.getValue(),
  }),
  col.accessor("rearWheelTravelMm", { header: "Rear travel (mm)", cell: (c) => c.getValue() }),
];

export function CatalogTable({ rows }: { rows: CatalogRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  // TanStack Table returns fresh functions each render; this component does not rely on memoizing them.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  return (
    <ScrollBox label="Bike models" className="rounded-xl border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Bike models</caption>
        <thead className="bg-stone-100 text-stone-700">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const dir = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    scope="col"
                    className="px-3 py-1"
                    aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : "none"}
                  >
                    <button
                      type="button"
                      className="min-h-11 font-semibold"
                      onClick={h.column.getToggleSortingHandler()}
                    >
                      {flexRender(h.column.columnDef.header, h.getContext())}{" "}
                      {dir === "asc" ? "▲" : dir === "desc" ? "▼" : ""}
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className="border-t border-stone-100">
              {r.getVisibleCells().map((c) => (
                <td key={c.id} className="px-3 py-2">
                  {flexRender(c.column.columnDef.cell, c.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {rows.length === 0 ? (
            <tr>
              <td colSpan={4} className="px-3 py-6 text-center text-stone-600">
                No models match.
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </ScrollBox>
  );
}
