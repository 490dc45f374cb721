import { requirePermission } from "@/lib/auth/session";
import { deleteSubmission, updateSubmission } from "@/lib/community/submissions";
import { getSubmissionDetail } from "@/lib/community/views";
import { handle, readJson } from "@/lib/http/handle";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";
import { submissionInput } from "@/lib/validation/submissions";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string }> };

export const GET = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  return Response.json(await getSubmissionDetail(id, user));
});

/** The submitter's changes to a proposal a moderator sent back. */
export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  const input = parseWith(submissionInput, await readJson(request));
  return Response.json(await updateSubmission(user, id, input));
});

/** The submitter withdraws a proposal that has not been decided. */
export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("proposals:create");
  const { id } = parseWith(idParam, await params);
  await deleteSubmission(user, id);
  return new Response(null, { status: 204 });
});
