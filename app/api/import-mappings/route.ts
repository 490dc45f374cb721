import { requirePermission } from "@/lib/auth/session";
import { handle, readJson } from "@/lib/http/handle";
import { savedMappings, saveMapping } from "@/lib/imports/imports";
import { savedMappingBody } from "@/lib/validation/imports";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async () => {
  await requirePermission("imports:review-queue");
  return Response.json({ mappings: await savedMappings() });
});

/** Saves a mapping under a name (the same name replaces it), for the next file from the same source. */
export const POST = handle(async (request) => {
  const user = await requirePermission("imports:review-queue");
  const { name, mapping } = parseWith(savedMappingBody, await readJson(request));
  const saved = await saveMapping(user, name, mapping);
  return Response.json({ id: saved.id, name: saved.name, mapping: saved.mapping }, { status: 201 });
});
