import { signOut } from "@/lib/auth/accounts";
import { clearSessionCookie, getCurrentSession } from "@/lib/auth/session";
import { handle } from "@/lib/http/handle";

export const runtime = "nodejs";

export const POST = handle(async () => {
  const { session } = await getCurrentSession();
  if (session) await signOut(session.id);
  await clearSessionCookie();
  return Response.json({ signedOut: true });
});
