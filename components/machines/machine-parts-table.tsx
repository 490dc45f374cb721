"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useState } from "react";
import type { MachinePartRow } from "@/lib/catalogue/browse";
import { CATEGORY_NAMES, FIT_NAMES } from "@/lib/catalogue/kinds";

const columns: Array<ColumnDef<MachinePartRow>> = [
  { accessorKey: "assembly", header: "Assembly" },
  {
    accessorKey: "number",
    header: "Factory number",
    cell: ({ row }) => (
      <Link href={`/parts/${row.original.partId}`} className="num whitespace-nowrap font-bold">
        {row.original.number}
      </Link>
    ),
  },
  { accessorKey: "description", header: "Part", cell: ({ row }) => <>{row.original.description}{row.original.serialNote && <span className="block text-sm text-ink-soft">{row.original.serialNote}</span>}</> },
  { accessorKey: "category", header: "Kind", cell: ({ getValue }) => CATEGORY_NAMES[getValue<MachinePartRow["category"]>()] },
  { accessorKey: "standard", header: "Standard equivalent", cell: ({ getValue }) => <span className="num">{getValue<string | null>() ?? "none approved yet"}</span> },
  {
    accessorKey: "fit",
    header: "Fit",
    cell: ({ getValue }) => {
      const fit = getValue<MachinePartRow["fit"]>();
      return fit ? (
        <span className="whitespace-nowrap">
          <span aria-hidden="true" className="mr-1 text-brass">{FIT_NAMES[fit].mark}</span>
          {FIT_NAMES[fit].word}
        </span>
      ) : (
        "—"
      );
    },
  },
];

/** A machine's parts: sort by any column, filter by any text (a number, an assembly, a designation). */
export function MachinePartsTable({ rows }: { rows: MachinePartRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState("");
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  return (
    <div className="space-y-3">
      <div className="max-w-md space-y-1">
        <label htmlFor="parts-filter" className="block font-bold">
          Filter the parts
        </label>
        <input
          id="parts-filter"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder="e.g. water pump, 6205, seal"
          className="min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground-raised px-3 text-lg focus:border-brass"
        />
      </div>
      <p className="text-sm text-ink-soft" role="status">
        {table.getRowModel().rows.length} of {rows.length} parts
      </p>
      <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
        <table className="w-full text-left">
          <thead className="bg-ground-sunk text-sm">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"} className="p-0">
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="flex min-h-12 w-full items-center gap-1 p-3 text-left font-bold hover:bg-ground">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-rule align-top">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="p-3">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
