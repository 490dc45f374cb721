import { after } from "next/server";
import { resendVerification } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { emailOnlyBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

// The same answer, in the same time, whether or not the address has an account waiting for confirmation: the work
// happens after the answer has gone, so neither its words nor its timing tell anyone who is a member.
export const POST = handle(async (request) => {
  const { email } = parseWith(emailOnlyBody, await readJson(request));
  after(() => resendVerification(email));
  return Response.json({ message: `If ${email} has an account waiting for confirmation, a new link is on its way.` });
});
