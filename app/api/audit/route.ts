import { listAudit } from "@/lib/audit/record";
import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { parseWith } from "@/lib/validation/parse";
import { auditQuery } from "@/lib/validation/proposals";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  await requirePermission("audit:read");
  const { limit, before } = parseWith(auditQuery, queryOf(request));
  return Response.json(await listAudit(limit, before));
});
