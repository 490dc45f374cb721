import { listAccounts } from "@/lib/auth/accounts";
import { requirePermission } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";

export const runtime = "nodejs";

export const GET = handle(async () => {
  await requirePermission("accounts:list");
  return Response.json({ users: await listAccounts() });
});
