"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { SortableTable } from "@/components/ui/sortable-table";
import { Unbroken } from "@/components/ui/unbroken";
import type { MachinePartRow } from "@/lib/catalogue/browse";
import { CATEGORY_NAMES, FIT_NAMES } from "@/lib/catalogue/kinds";

const columns: Array<ColumnDef<MachinePartRow>> = [
  { accessorKey: "assembly", header: "Assembly" },
  {
    accessorKey: "number",
    header: "Factory number",
    cell: ({ row }) => (
      <Link href={`/parts/${row.original.partId}`} className="num font-bold whitespace-nowrap">
        {row.original.number}
      </Link>
    ),
  },
  {
    accessorKey: "description",
    header: "Part",
    cell: ({ row }) => (
      <>
        {row.original.description}
        {row.original.serialNote && <span className="block text-sm text-ink-soft">{row.original.serialNote}</span>}
      </>
    ),
  },
  {
    accessorKey: "serials",
    header: "Serials",
    cell: ({ getValue }) => (
      <span className="num text-sm">
        <Unbroken text={getValue<string | null>() ?? "all"} />
      </span>
    ),
  },
  {
    accessorKey: "category",
    header: "Kind",
    cell: ({ getValue }) => CATEGORY_NAMES[getValue<MachinePartRow["category"]>()],
  },
  {
    accessorKey: "standard",
    header: "Standard equivalent",
    cell: ({ row }) => (
      <>
        <span className="num">{row.original.standard ?? "none approved yet"}</span>
        {row.original.viaNumber && (
          <span className="block text-sm text-ink-soft">
            <Unbroken text={`recorded on ${row.original.viaNumber}`} />
          </span>
        )}
      </>
    ),
  },
  {
    accessorKey: "fit",
    header: "Fit",
    cell: ({ getValue }) => {
      const fit = getValue<MachinePartRow["fit"]>();
      return fit ? (
        <span className="whitespace-nowrap">
          <span aria-hidden="true" className="mr-1 text-brass">
            {FIT_NAMES[fit].mark}
          </span>
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
  return (
    <SortableTable
      rows={rows}
      columns={columns}
      filter={{ label: "Filter the parts", placeholder: "e.g. water pump, 6205, seal" }}
      count={(shown, total) => `${shown} of ${total} parts`}
    />
  );
}
