import { requireUser } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";

export const runtime = "nodejs";

export const GET = handle(async () => {
  const user = await requireUser();
  return Response.json({
    user: { id: user.id, email: user.email, role: user.role, emailVerified: user.emailVerified },
  });
});
