import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { importChanges } from "@/lib/imports/imports";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** What the commit wrote: one entry per record inserted or updated, with the file line it came from. */
export const GET = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  return Response.json(await importChanges(user, id));
});
