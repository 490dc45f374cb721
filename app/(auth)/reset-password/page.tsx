import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { Notice } from "@/components/ui/notice";

export const metadata: Metadata = { title: "Set a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <div className="space-y-6">
      <h1 className="text-3xl">Set a new password</h1>
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <Notice tone="caution">
          This page needs the link from the e-mail we sent. <Link href="/forgot-password">Ask for a new link</Link>
        </Notice>
      )}
    </div>
  );
}
