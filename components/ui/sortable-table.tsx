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
import { useId, useState } from "react";

export interface SortableTableProps<T> {
  rows: T[];
  columns: Array<ColumnDef<T>>;
  initialSorting?: SortingState;
  /** A text box that filters on any column, when given. */
  filter?: { label: string; placeholder: string };
  /** "12 of 40 parts" */
  count: (shown: number, total: number) => string;
  rowTestId?: string;
}

/** A table whose column headers sort it (click again to reverse), with an optional filter box above. */
export function SortableTable<T>({
  rows,
  columns,
  initialSorting = [],
  filter,
  count,
  rowTestId,
}: SortableTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const [text, setText] = useState("");
  const filterId = useId();
  // TanStack Table hands back functions whose identity changes each render, so the compiler leaves this one alone.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: text },
    onSortingChange: setSorting,
    onGlobalFilterChange: setText,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  return (
    <div className="space-y-3">
      {filter && (
        <div className="max-w-md space-y-1">
          <label htmlFor={filterId} className="block font-bold">
            {filter.label}
          </label>
          <input
            id={filterId}
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder={filter.placeholder}
            className={
              "min-h-12 w-full rounded-md border-2 border-rule-strong " +
              "bg-ground-raised px-3 text-lg focus:border-brass"
            }
          />
        </div>
      )}
      <p className="text-sm text-ink-soft" role="status">
        {count(table.getRowModel().rows.length, rows.length)}
      </p>
      <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
        <table className="w-full text-left">
          <thead className="bg-ground-sunk text-sm">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  if (!header.column.getCanSort()) {
                    return (
                      <th key={header.id} scope="col" className="p-3 font-bold">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                      </th>
                    );
                  }
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                      className="p-0"
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="flex min-h-12 w-full items-center gap-1 p-3 text-left font-bold hover:bg-ground"
                      >
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
              <tr key={row.id} className="border-t border-rule align-top" data-testid={rowTestId}>
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
