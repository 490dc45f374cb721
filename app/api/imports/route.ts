import { after } from "next/server";
import { requirePermission } from "@/lib/auth/session";
import { env, isProduction } from "@/lib/env";
import { handle } from "@/lib/http/handle";
import { wroteCookieHeader } from "@/lib/http/read-own-writes";
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
  const wrote = wroteCookieHeader(env.DATABASE_READ_URLS.length, isProduction);
  return Response.json(await getImport(user, id), { status: 202, headers: wrote ? { "Set-Cookie": wrote } : {} });
});

export const GET = handle(async () => {
  const user = await requirePermission("imports:review-queue");
  return Response.json({ imports: await recentImports(user) });
});
