import { signIn } from "@/lib/auth/accounts";
import { setSessionCookie } from "@/lib/auth/session";
import { clientAddress } from "@/lib/http/client-address";
import { handle, readJson } from "@/lib/http/handle";
import { signInBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const body = parseWith(signInBody, await readJson(request));
  const { user, sessionId } = await signIn({ ...body, address: clientAddress(request.headers) });
  await setSessionCookie(sessionId);
  return Response.json({ user: { id: user.id, email: user.email, role: user.role } });
});
