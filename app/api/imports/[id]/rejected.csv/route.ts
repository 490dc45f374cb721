import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { rejectedCsv } from "@/lib/imports/imports";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

export const GET = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  return new Response(`\uFEFF${await rejectedCsv(user, id)}`, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="import-${id}-rejected.csv"`,
    },
  });
});
