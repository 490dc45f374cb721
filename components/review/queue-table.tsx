"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { FitBadge } from "@/components/parts/fit-badge";
import { EmailAddress } from "@/components/ui/email-address";
import { SortableTable } from "@/components/ui/sortable-table";
import type { ProposalRow } from "@/lib/proposals/views";

function waited(iso: string): string {
  const days = Math.floor((Date.now() - Date.parse(iso)) / 86_400_000);
  if (days < 1) return "today";
  return days === 1 ? "1 day" : `${days} days`;
}

const columns: Array<ColumnDef<ProposalRow>> = [
  {
    accessorKey: "createdAt",
    header: "Waiting",
    cell: ({ getValue }) => <span className="whitespace-nowrap">{waited(getValue<string>())}</span>,
  },
  {
    accessorKey: "partNumber",
    header: "Factory number",
    cell: ({ row }) => (
      <Link href={`/review/${row.original.id}`} className="num font-bold whitespace-nowrap">
        {row.original.partNumber}
      </Link>
    ),
  },
  { accessorKey: "maker", header: "Maker" },
  { accessorKey: "categoryName", header: "Kind" },
  {
    accessorKey: "standard",
    header: "Proposed standard part",
    cell: ({ getValue }) => <span className="num">{getValue<string>()}</span>,
  },
  { accessorKey: "fit", header: "Fit", cell: ({ row }) => <FitBadge fit={row.original.fit} /> },
  {
    id: "evidence",
    header: "Evidence",
    enableSorting: false,
    cell: ({ row }) => {
      const r = row.original;
      const bits = [`${r.photos} ${r.photos === 1 ? "photo" : "photos"}`];
      if (r.confirmations > 0) bits.push(`${r.confirmations} also fitted`);
      return (
        <span className="text-sm">
          {bits.join(" · ")}
          {r.warnings > 0 && (
            <span className="block font-bold text-caution">
              ⚠ {r.warnings} engine {r.warnings === 1 ? "warning" : "warnings"}
            </span>
          )}
        </span>
      );
    },
  },
  {
    accessorKey: "submitter",
    header: "From",
    cell: ({ getValue }) => (
      <span className="text-sm">
        <EmailAddress address={getValue<string>()} />
      </span>
    ),
  },
];

/** Proposals waiting for a decision, oldest first unless sorted otherwise. */
export function QueueTable({ rows }: { rows: ProposalRow[] }) {
  return (
    <SortableTable
      rows={rows}
      columns={columns}
      initialSorting={[{ id: "createdAt", desc: false }]}
      count={(shown, total) => `${shown} of ${total} shown`}
      rowTestId="queue-row"
    />
  );
}
