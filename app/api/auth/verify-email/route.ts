import { verifyEmail } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { verifyEmailBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const { token } = parseWith(verifyEmailBody, await readJson(request));
  const user = await verifyEmail(token);
  return Response.json({ user: { id: user.id, email: user.email, role: user.role, emailVerified: true } });
});
