import { requirePermission } from "@/lib/auth/session";
import { grantUpload } from "@/lib/proposals/photos";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { presignInput } from "@/lib/validation/proposals";

export const runtime = "nodejs";

/** A presigned PUT for one photo; the browser sends the file straight to storage with it. */
export const POST = handle(async (request) => {
  const user = await requirePermission("proposals:create");
  const file = parseWith(presignInput, await readJson(request));
  return Response.json(await grantUpload(user.id, file), { status: 201 });
});
