import { after } from "next/server";
import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { discardImport, dryRun, getImport, setMapping } from "@/lib/imports/imports";
import { mappingBody } from "@/lib/validation/imports";
import { parseWith } from "@/lib/validation/parse";
import { idParam } from "@/lib/validation/ids";

export const runtime = "nodejs";

type Context = { params: Promise<{ id: string }> };

/** Status, counts, progress, the mapping and the first 200 rejected rows. */
export const GET = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  return Response.json(await getImport(user, id));
});

/** A corrected column mapping: `{"mapping":{"number":"Part No.", …}}`; the dry run runs again. */
export const PATCH = handle<Context>(async (request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  const { mapping } = parseWith(mappingBody, await readJson(request));
  await setMapping(user, id, mapping);
  after(() => dryRun(id));
  return Response.json(await getImport(user, id), { status: 202 });
});

/** Throws away an import that was never committed (its dry run, rejected rows and file). */
export const DELETE = handle<Context>(async (_request, { params }) => {
  const user = await requirePermission("imports:review-queue");
  const { id } = parseWith(idParam, await params);
  await discardImport(user, id);
  return new Response(null, { status: 204 });
});
