import { z } from "zod";
import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { removeLine, updateLine } from "@/lib/lists/lists";
import { linePatch } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/submissions";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string; lineId: string }> };
const params2 = idParam.extend({ lineId: z.coerce.number({ error: "A line id is a number." }).int("A line id is a whole number.").positive("A line id is positive.").max(2_147_483_647, "No line has that id.") });

export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(params2, await params);
  await updateLine(user.id, id, lineId, parseWith(linePatch, await readJson(request)));
  return Response.json({ updated: true });
});

export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(params2, await params);
  await removeLine(user.id, id, lineId);
  return new Response(null, { status: 204 });
});
