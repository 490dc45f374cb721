import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ImportDetail } from "@/components/imports/import-detail";
import { hasPermission } from "@/lib/auth/roles";
import { requirePagePermission } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { getImport } from "@/lib/imports/imports";

export const metadata: Metadata = { title: "Import" };

export default async function ImportPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("imports:review-queue", `/admin/imports/${idText}`);
  const id = Number(idText);
  if (!Number.isInteger(id) || id <= 0 || id >= 2 ** 31) notFound();
  const view = await getImport(user, id).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return <ImportDetail initial={view} isAdmin={hasPermission(user.role, "imports:commit")} />;
}
