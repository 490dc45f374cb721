import { requirePermission } from "@/lib/auth/session";
import { decide } from "@/lib/proposals/proposals";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";
import { decisionInput } from "@/lib/validation/proposals";

export const runtime = "nodejs";

export const POST = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const moderator = await requirePermission("proposals:review");
  const { id } = parseWith(idParam, await params);
  const decision = parseWith(decisionInput, await readJson(request));
  return Response.json(await decide(moderator, id, decision));
});
