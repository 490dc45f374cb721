import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { listAccess } from "@/lib/lists/access";
import { deleteList, getList, updateList } from "@/lib/lists/lists";
import { listPatch } from "@/lib/validation/lists";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string }> };

export const GET = handle<Context>(async (request, { params }) => {
  const { id } = parseWith(idParam, await params);
  return Response.json(await getList(await listAccess(request), id));
});

export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id } = parseWith(idParam, await params);
  await updateList(user.id, id, parseWith(listPatch, await readJson(request)));
  return Response.json(await getList({ userId: user.id }, id));
});

export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("lists:manage");
  const { id } = parseWith(idParam, await params);
  await deleteList(user.id, id);
  return new Response(null, { status: 204 });
});
