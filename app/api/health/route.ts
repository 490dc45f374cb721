import { checkHealth } from "@/lib/health/check";
import { handle } from "@/lib/http/handle";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const report = await checkHealth();
  return Response.json(report, { status: report.ok ? 200 : 503 });
});
