"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
  type Table,
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
      <NarrowSort table={table} />
      {/* Below a laptop's width each row stacks into a card, each value under its column's name: nothing to scroll. */}
      <div className="rounded-lg border border-rule bg-ground-raised lg:overflow-x-auto">
        <table className="w-full text-left max-lg:block">
          <thead className="bg-ground-sunk text-sm max-lg:hidden">
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
          <tbody className="max-lg:block">
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                className={
                  "border-t border-rule align-top max-lg:grid max-lg:grid-cols-2 max-lg:gap-x-3 max-lg:p-2 " +
                  "max-lg:first:border-t-0"
                }
                data-testid={rowTestId}
              >
                {row.getVisibleCells().map((cell) => {
                  const header = cell.column.columnDef.header;
                  return (
                    <td key={cell.id} className="p-3 max-lg:block max-lg:px-1 max-lg:py-1">
                      {typeof header === "string" && header !== "" && (
                        <span className="block text-xs font-bold tracking-wide text-ink-faint uppercase lg:hidden">
                          {header}
                        </span>
                      )}
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** On a narrow screen the column headers are hidden with the table's head: sorting is a choice above the cards. */
function NarrowSort<T>({ table }: { table: Table<T> }) {
  const id = useId();
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort() && typeof c.columnDef.header === "string");
  if (sortable.length === 0) return null;
  const [current] = table.getState().sorting;
  const value = current ? `${current.id}:${current.desc ? "desc" : "asc"}` : "";
  return (
    <div className="flex flex-wrap items-center gap-2 lg:hidden">
      <label htmlFor={id} className="font-bold">
        Sort by
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => {
          const [column, direction] = e.target.value.split(":");
          table.setSorting(column ? [{ id: column, desc: direction === "desc" }] : []);
        }}
        className="min-h-11 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
      >
        <option value="">As listed</option>
        {sortable.flatMap((c) => [
          <option key={`${c.id}:asc`} value={`${c.id}:asc`}>
            {String(c.columnDef.header)}, A to Z
          </option>,
          <option key={`${c.id}:desc`} value={`${c.id}:desc`}>
            {String(c.columnDef.header)}, Z to A
          </option>,
        ])}
      </select>
    </div>
  );
}
