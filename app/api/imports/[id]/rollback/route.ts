import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { getImport, rollbackImport } from "@/lib/imports/imports";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

export const POST = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("imports:commit");
  const { id } = parseWith(idParam, await params);
  const result = await rollbackImport(user, id);
  return Response.json({ ...result, import: await getImport(user, id) });
});
