import { requirePermission } from "@/lib/auth/session";
import { confirmCross } from "@/lib/proposals/proposals";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";
import { confirmationInput } from "@/lib/validation/proposals";

export const runtime = "nodejs";

/** "I fitted this too": once per member and cross. */
export const POST = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  const { note } = parseWith(confirmationInput, await readJson(request));
  return Response.json(await confirmCross(user, id, note), { status: 201 });
});
