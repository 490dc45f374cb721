import { resendVerification } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { emailOnlyBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

// The same answer whether or not the address has an account, so nobody can probe for members.
export const POST = handle(async (request) => {
  const { email } = parseWith(emailOnlyBody, await readJson(request));
  const { mailSent } = await resendVerification(email);
  return Response.json({
    message: mailSent
      ? `If ${email} has an account waiting for confirmation, a new link is on its way.`
      : "The e-mail could not be sent just now. Please try again in a few minutes.",
    mailSent,
  });
});
