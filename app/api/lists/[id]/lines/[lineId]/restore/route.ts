import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { restoreLine } from "@/lib/lists/lists";
import { parseWith } from "@/lib/validation/parse";
import { listLineParams } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** Undoes a removal made in the last few minutes (see `UNDO_SECONDS`). */
export const POST = handle<{ params: Promise<{ id: string; lineId: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(listLineParams, await params);
  return Response.json(await restoreLine(user.id, id, lineId));
});
