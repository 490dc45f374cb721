import { setAccountRole } from "@/lib/auth/accounts";
import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { setRoleBody } from "@/lib/validation/account";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const PATCH = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const actor = await requirePermission("accounts:set-role");
  const { role } = parseWith(setRoleBody, await readJson(request));
  const { id } = await params;
  return Response.json({ user: await setAccountRole({ actorId: actor.id, userId: id, role }) });
});
