import { requestPasswordReset } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { emailOnlyBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const { email } = parseWith(emailOnlyBody, await readJson(request));
  const { mailSent } = await requestPasswordReset(email);
  return Response.json({
    message: mailSent
      ? `If ${email} has an account, a link to set a new password is on its way.`
      : "The e-mail could not be sent just now. Please try again in a few minutes.",
    mailSent,
  });
});
