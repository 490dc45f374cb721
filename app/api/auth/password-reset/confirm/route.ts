import { resetPassword } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { resetPasswordBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const body = parseWith(resetPasswordBody, await readJson(request));
  const user = await resetPassword(body);
  return Response.json({
    message: "Your password is set. Sign in with it now.",
    user: { id: user.id, email: user.email },
  });
});
