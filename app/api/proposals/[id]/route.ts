import { requirePermission } from "@/lib/auth/session";
import { deleteProposal, updateProposal } from "@/lib/proposals/proposals";
import { getProposalDetail } from "@/lib/proposals/views";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";
import { proposalInput } from "@/lib/validation/proposals";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string }> };

export const GET = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  return Response.json(await getProposalDetail(id, user));
});

/** The submitter's changes to a proposal a moderator sent back. */
export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  const input = parseWith(proposalInput, await readJson(request));
  return Response.json(await updateProposal(user, id, input));
});

/** The submitter withdraws a proposal that has not been decided. */
export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  await deleteProposal(user, id);
  return new Response(null, { status: 204 });
});
