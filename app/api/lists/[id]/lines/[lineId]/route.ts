import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { removeLine, updateLine } from "@/lib/lists/lists";
import { linePatch } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { listLineParams } from "@/lib/validation/ids";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string; lineId: string }> };
export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(listLineParams, await params);
  await updateLine(user.id, id, lineId, parseWith(linePatch, await readJson(request)));
  return Response.json({ updated: true });
});

export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(listLineParams, await params);
  // The answer says how long the removal can be undone (POST …/restore).
  return Response.json(await removeLine(user.id, id, lineId));
});
