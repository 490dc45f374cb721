import { after } from "next/server";
import { requestPasswordReset } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { emailOnlyBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

// The same answer, in the same time, whether or not the address has an account: the look-up, the link and the mail
// happen after the answer has gone, so neither its words nor its timing tell anyone who is a member.
export const POST = handle(async (request) => {
  const { email } = parseWith(emailOnlyBody, await readJson(request));
  after(() => requestPasswordReset(email));
  return Response.json({ message: `If ${email} has an account, a link to set a new password is on its way.` });
});
