"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { EmailOnlyForm } from "@/components/auth/email-only-form";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { signInBody, type SignInBody } from "@/lib/validation/auth";

/** `next` is a path on this site, already checked by the page (safeReturnPath), so a crafted link cannot lead away. */
export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [unverifiedEmail, setUnverifiedEmail] = useState<string | null>(null);
  const { form, onSubmit, formError, pending } = useApiForm<SignInBody, SignInBody, unknown>({
    schema: signInBody,
    endpoint: "/api/auth/sign-in",
    defaultValues: { email: "", password: "" },
    onSuccess: () => {
      router.replace(next);
      router.refresh();
    },
    onError: (error) => {
      if (error.error !== "email_not_verified") return false;
      setUnverifiedEmail(form.getValues("email"));
      return true;
    },
  });
  const { errors } = form.formState;

  return (
    <div className="space-y-5">
      <form
        onSubmit={onSubmit}
        noValidate
        className="space-y-5"
        aria-describedby={formError ? "sign-in-error" : undefined}
      >
        {formError && (
          <div id="sign-in-error">
            <Notice tone="caution" role="alert">
              {formError}
            </Notice>
          </div>
        )}
        <Field
          id="email"
          label="E-mail"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...form.register("email")}
        />
        <Field
          id="password"
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...form.register("password")}
        />
        <div className="flex flex-wrap items-center justify-between gap-3">
          <Button type="submit" pending={pending}>
            Sign in
          </Button>
          <Link href="/forgot-password">Forgotten your password?</Link>
        </div>
      </form>
      {unverifiedEmail && (
        <div className="space-y-3 rounded-lg border border-rule-strong bg-ground-sunk p-4">
          <Notice tone="caution" role="alert">
            Confirm your e-mail address first: open the link we sent to <strong>{unverifiedEmail}</strong>.
          </Notice>
          <EmailOnlyForm
            endpoint="/api/auth/resend-verification"
            submitLabel="Send the link again"
            defaultEmail={unverifiedEmail}
            hideEmail
          />
        </div>
      )}
    </div>
  );
}
