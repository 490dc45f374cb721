import { requirePermission } from "@/lib/auth/session";
import { createProposal } from "@/lib/proposals/proposals";
import { proposalsOf, reviewQueue } from "@/lib/proposals/views";
import { handle, readJson } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { parseWith } from "@/lib/validation/parse";
import { proposalInput, proposalsQuery } from "@/lib/validation/proposals";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const user = await requirePermission("proposals:create");
  const input = parseWith(proposalInput, await readJson(request));
  const result = await createProposal(user, input);
  return Response.json(result, { status: result.outcome === "submitted" ? 201 : 200 });
});

/** `?mine=1`: the signed-in member's own proposals. Without it: the review queue, for reviewers. */
export const GET = handle(async (request) => {
  const query = parseWith(proposalsQuery, queryOf(request));
  if (query.mine) {
    const user = await requirePermission("proposals:create");
    return Response.json({ proposals: await proposalsOf(user.id) });
  }
  await requirePermission("proposals:review");
  const { rows, total } = await reviewQueue({
    status: query.status,
    category: query.category,
    makerId: query.maker,
    q: query.q || undefined,
    limit: query.limit,
    offset: query.offset,
  });
  return Response.json({ proposals: rows, total });
});
