import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { addLine } from "@/lib/lists/lists";
import { lineInput } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** `{"partId"}` or `{"number"}` (resolved through supersessions to the latest number), with `quantity` and `notes`. */
export const POST = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id } = parseWith(idParam, await params);
  const input = parseWith(lineInput, await readJson(request));
  const result = await addLine(user.id, id, input);
  return Response.json(result, { status: result.merged ? 200 : 201 });
});
