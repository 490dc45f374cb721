import type { Metadata } from "next";
import Link from "next/link";
import { ListSheet } from "@/components/lists/list-sheet";
import { PrintButton } from "@/components/lists/print-button";
import { requirePagePermission } from "@/lib/auth/session";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { getList } from "@/lib/lists/lists";

export const metadata: Metadata = { title: "Job list, printable" };

export default async function PrintListPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("lists:manage", `/lists/${idText}/print`);
  const view = await loadByIdOr404(idText, (id) => getList({ userId: user.id }, id));
  return (
    <div className="space-y-4">
      <p className="no-print flex flex-wrap items-center gap-4">
        <PrintButton />
        <Link href={`/lists/${view.id}`}>Back to the list</Link>
        <span className="text-sm text-ink-soft">Fits A4 and US Letter, portrait.</span>
      </p>
      <ListSheet view={view} />
    </div>
  );
}
