import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { addRestOfAssembly } from "@/lib/lists/lists";
import { assemblyInput } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { listLineParams } from "@/lib/validation/ids";

export const runtime = "nodejs";

/**
 * Adds the other parts of this line's assembly, one a position. `{"serial"}` picks the parts of that serial when the
 * list has none; without either, a 400 with `choices` lists the serial ranges to pick from.
 */
export const POST = handle<{ params: Promise<{ id: string; lineId: string }> }>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id, lineId } = parseWith(listLineParams, await params);
  const input = parseWith(assemblyInput, await readJson(request));
  return Response.json(await addRestOfAssembly(user.id, id, lineId, input));
});
