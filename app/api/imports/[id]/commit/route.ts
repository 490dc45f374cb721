import { after } from "next/server";
import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { getImport, runCommit, startCommit } from "@/lib/imports/imports";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

/** Starts the commit (202); poll GET /api/imports/{id} until the status is committed, or parsed with an error. */
export const POST = handle<{ params: Promise<{ id: string }> }>(async (_request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  await startCommit(user, id);
  after(() => runCommit(user, id));
  return Response.json(await getImport(user, id), { status: 202 });
});
