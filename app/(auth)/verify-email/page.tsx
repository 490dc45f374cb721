import type { Metadata } from "next";
import Link from "next/link";
import { EmailOnlyForm } from "@/components/auth/email-only-form";
import { Notice } from "@/components/ui/notice";
import { verifyEmail } from "@/lib/auth/accounts";
import { AppError } from "@/lib/errors";
import { verifyEmailBody } from "@/lib/validation/auth";

export const metadata: Metadata = { title: "Confirm your e-mail" };

async function confirm(token: string | undefined): Promise<{ email: string } | { problem: string }> {
  const parsed = verifyEmailBody.safeParse({ token });
  if (!parsed.success) return { problem: "This page needs the link from the e-mail we sent." };
  try {
    return { email: (await verifyEmail(parsed.data.token)).email };
  } catch (error) {
    if (error instanceof AppError) return { problem: error.message };
    throw error;
  }
}

// Opening the link from the e-mail is the confirmation: one click, as people expect.
export default async function VerifyEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const outcome = await confirm(token);
  return (
    <div className="space-y-6">
      <h1 className="text-3xl">Confirm your e-mail</h1>
      {"email" in outcome ? (
        <>
          <Notice tone="success" role="status">
            Your e-mail address <strong>{outcome.email}</strong> is confirmed.
          </Notice>
          <Link
            href="/sign-in"
            className={
              "inline-flex min-h-12 items-center rounded-md bg-ink px-5 font-bold " +
              "text-ground no-underline hover:bg-ink-soft"
            }
          >
            Sign in now
          </Link>
        </>
      ) : (
        <>
          <Notice tone="caution" role="alert">
            {outcome.problem}
          </Notice>
          <p className="text-ink-soft">Give your e-mail and we will send a fresh link.</p>
          <EmailOnlyForm endpoint="/api/auth/resend-verification" submitLabel="Send a new link" />
        </>
      )}
    </div>
  );
}
