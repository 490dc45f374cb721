import { requirePermission } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { handle, readJson } from "@/lib/http/handle";
import { setSharing } from "@/lib/lists/lists";
import { shareInput } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** `{"enabled":true}` makes a read-only link (a new one each time); `false` turns it off. */
export const POST = handle<{ params: Promise<{ id: string }> }>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id } = parseWith(idParam, await params);
  const { enabled } = parseWith(shareInput, await readJson(request));
  const token = await setSharing(user.id, id, enabled);
  return Response.json({ token, url: token ? `${env.APP_URL}/lists/shared/${id}?token=${token}` : null });
});
