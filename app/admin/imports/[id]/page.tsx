import type { Metadata } from "next";
import { ImportDetail } from "@/components/imports/import-detail";
import { hasPermission } from "@/lib/auth/roles";
import { requirePagePermission } from "@/lib/auth/session";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { getImport } from "@/lib/imports/imports";

export const metadata: Metadata = { title: "Import" };

export default async function ImportPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("imports:review-queue", `/admin/imports/${idText}`);
  const view = await loadByIdOr404(idText, (id) => getImport(user, id));
  return <ImportDetail initial={view} isAdmin={hasPermission(user.role, "imports:commit")} />;
}
