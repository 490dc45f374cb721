import { after } from "next/server";
import { requirePermission } from "@/lib/auth/session";
import { cookies } from "next/headers";
import { env } from "@/lib/env";
import { handle } from "@/lib/http/handle";
import { WROTE_COOKIE, WROTE_COOKIE_ATTRIBUTES } from "@/lib/http/read-own-writes";
import { assertOwnOrigin, readUpload } from "@/lib/http/upload";
import { dryRun, getImport, recentImports, startImport } from "@/lib/imports/imports";
import { IMPORT_MAX_BYTES } from "@/lib/imports/kinds";
import { importUploadFields } from "@/lib/validation/imports";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

/** Multipart upload: `file` (CSV), `target` (catalogue | review_queue), `mappingId` (optional); the dry run follows. */
export const POST = handle(async (request) => {
  assertOwnOrigin(request);
  const user = await requirePermission("imports:review-queue");
  const { file, form } = await readUpload(request, IMPORT_MAX_BYTES);
  const fields = parseWith(importUploadFields, {
    target: form.get("target") ?? undefined,
    mappingId: form.get("mappingId") || undefined,
  });
  const id = await startImport(user, file, fields);
  after(() => dryRun(id));
  // This upload bypasses the proxy, so it says itself that the browser has just written (read replicas).
  if (env.DATABASE_READ_URLS.length > 0) (await cookies()).set(WROTE_COOKIE, "1", WROTE_COOKIE_ATTRIBUTES);
  return Response.json(await getImport(user, id), { status: 202 });
});

export const GET = handle(async () => {
  const user = await requirePermission("imports:review-queue");
  return Response.json({ imports: await recentImports(user) });
});
