import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { safeReturnPath } from "@/lib/auth/return-path";
import { getCurrentSession } from "@/lib/auth/session";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  const { user } = await getCurrentSession();
  if (user) redirect("/account");
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl">Sign in</h1>
        <p className="mt-1 text-ink-soft">
          To propose crosses you have fitted, confirm others&apos; and keep job lists.
        </p>
      </div>
      <SignInForm next={safeReturnPath(next, env.APP_URL)} />
      <p className="border-t border-rule pt-4 text-ink-soft">
        New here? <Link href="/sign-up">Open an account</Link>. Looking up numbers needs no account.
      </p>
    </div>
  );
}
