import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ListSheet } from "@/components/lists/list-sheet";
import { PrintButton } from "@/components/lists/print-button";
import { requirePagePermission } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { getList } from "@/lib/lists/lists";

export const metadata: Metadata = { title: "Job list, printable" };

export default async function PrintListPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("lists:manage", `/lists/${idText}/print`);
  const id = Number(idText);
  if (!Number.isInteger(id) || id <= 0 || id >= 2 ** 31) notFound();
  const view = await getList({ userId: user.id }, id).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <div className="space-y-4">
      <p className="no-print flex flex-wrap items-center gap-4">
        <PrintButton />
        <Link href={`/lists/${id}`}>Back to the list</Link>
        <span className="text-sm text-ink-soft">Fits A4 and US Letter, portrait.</span>
      </p>
      <ListSheet view={view} />
    </div>
  );
}
