import { after } from "next/server";
import { requirePermission } from "@/lib/auth/session";
import { hasPermission } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { handle } from "@/lib/http/handle";
import { isOwnOrigin } from "@/lib/http/origin";
import { createImport, dryRun, getImport, listImports } from "@/lib/imports/imports";
import { IMPORT_MAX_BYTES } from "@/lib/imports/kinds";
import { importUploadFields } from "@/lib/validation/imports";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

/**
 * Multipart upload: `file` (CSV), `target` (catalogue | review_queue), `mappingId` (optional). The dry run starts at
 * once.
 */
export const POST = handle(async (request) => {
  // This route bypasses the request proxy (so that its large body is not buffered there): the CSRF check is here.
  if (!isOwnOrigin(request.headers, new URL(request.url), process.env.APP_URL)) {
    throw new AppError(
      "forbidden_origin",
      "This request did not come from an Understudy page. Send an Origin header matching this site.",
    );
  }
  const user = await requirePermission("imports:review-queue");
  if (Number(request.headers.get("content-length") ?? 0) > IMPORT_MAX_BYTES + 1024 * 1024) {
    throw new AppError("validation_failed", `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB.`, {
      field: "file",
    });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError("validation_failed", "Send the file as multipart/form-data, in a field named file.", {
      field: "file",
    });
  }
  const file = form.get("file");
  if (!(file instanceof File))
    throw new AppError("validation_failed", "Choose a CSV file to import.", { field: "file" });
  const fields = parseWith(importUploadFields, {
    target: form.get("target") ?? undefined,
    mappingId: form.get("mappingId") || undefined,
  });
  const target = fields.target ?? (hasPermission(user.role, "imports:commit") ? "catalogue" : "review_queue");
  const created = await createImport(
    user,
    { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) },
    target,
    fields.mappingId,
  );
  after(() => dryRun(created.id));
  return Response.json(await getImport(user, created.id), { status: 202 });
});

export const GET = handle(async () => {
  const user = await requirePermission("imports:review-queue");
  return Response.json({ imports: await listImports(user) });
});
