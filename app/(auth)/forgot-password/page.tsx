import type { Metadata } from "next";
import Link from "next/link";
import { EmailOnlyForm } from "@/components/auth/email-only-form";

export const metadata: Metadata = { title: "Forgotten password" };

export default function ForgotPasswordPage() {
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl">Forgotten password</h1>
        <p className="mt-1 text-ink-soft">
          Give the e-mail of your account and we will send a link to set a new password.
        </p>
      </div>
      <EmailOnlyForm endpoint="/api/auth/password-reset/request" submitLabel="Send me a link" />
      <p className="border-t border-rule pt-4">
        <Link href="/sign-in">Back to sign in</Link>
      </p>
    </div>
  );
}
