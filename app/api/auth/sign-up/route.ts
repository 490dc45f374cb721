import { signUp } from "@/lib/auth/accounts";
import { handle, readJson } from "@/lib/http/handle";
import { signUpBody } from "@/lib/validation/auth";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const POST = handle(async (request) => {
  const body = parseWith(signUpBody, await readJson(request));
  const { mailSent } = await signUp(body);
  return Response.json(
    {
      message: mailSent
        ? `We sent a confirmation link to ${body.email}. Open it to finish.`
        : "Your request was saved, but the confirmation e-mail could not be sent " +
          "just now. Ask for a new link from the sign-in page.",
      mailSent,
    },
    { status: 201 },
  );
});
