import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { isProduction } from "@/lib/env";

export const metadata: Metadata = { title: "Open an account" };

export default function SignUpPage() {
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl">Open an account</h1>
        <p className="mt-1 text-ink-soft">
          Members propose the crosses they have fitted and keep job lists. We send a link to confirm your e-mail.
        </p>
      </div>
      <SignUpForm mailPreviewHref={isProduction ? undefined : "/dev/mail"} />
      <p className="border-t border-rule pt-4 text-ink-soft">
        Already a member? <Link href="/sign-in">Sign in</Link>
      </p>
    </div>
  );
}
