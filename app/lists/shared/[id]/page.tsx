import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ListSheet } from "@/components/lists/list-sheet";
import { PrintButton } from "@/components/lists/print-button";
import { AppError } from "@/lib/errors";
import { getList } from "@/lib/lists/lists";

export const metadata: Metadata = { title: "Shared job list", robots: { index: false } };

/** Read-only, for whoever holds the link: no sign-in, no changes. */
export default async function SharedListPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ token?: string }>;
}) {
  const id = Number((await params).id);
  const token = (await searchParams).token ?? "";
  if (!Number.isInteger(id) || id <= 0 || id >= 2 ** 31 || token.length < 10 || token.length > 64) notFound();
  const view = await getList({ token }, id).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <div className="space-y-4">
      <p className="no-print flex flex-wrap items-center gap-4">
        <PrintButton />
        <a href={`/api/lists/${id}/export.csv?token=${encodeURIComponent(token)}`} download className="font-bold">
          Download CSV
        </a>
        <span className="text-sm text-ink-soft">A read-only copy shared by its owner.</span>
      </p>
      <ListSheet view={view} />
    </div>
  );
}
