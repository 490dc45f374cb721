import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { createList, jobListsOf } from "@/lib/lists/lists";
import { newListInput } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async () => {
  const user = await requirePermission("lists:manage");
  return Response.json({ lists: await jobListsOf(user.id) });
});

export const POST = handle(async (request) => {
  const user = await requirePermission("lists:manage");
  const input = parseWith(newListInput, await readJson(request));
  return Response.json(await createList(user.id, input), { status: 201 });
});
