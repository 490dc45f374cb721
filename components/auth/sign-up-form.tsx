"use client";

import { useState } from "react";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { signUpBody, type SignUpBody } from "@/lib/validation/auth";

export function SignUpForm({ mailPreviewHref }: { mailPreviewHref?: string }) {
  const [sent, setSent] = useState<string | null>(null);
  const { form, onSubmit, formError, pending } = useApiForm<SignUpBody, SignUpBody, { message: string }>({
    schema: signUpBody,
    endpoint: "/api/auth/sign-up",
    defaultValues: { email: "", password: "" },
    onSuccess: (data) => setSent(data.message),
  });
  const { errors } = form.formState;

  if (sent) {
    return (
      <div className="space-y-3">
        <Notice tone="success" role="status">
          {sent}
        </Notice>
        {mailPreviewHref && (
          <p className="text-sm text-ink-soft">
            This is a demo installation: mail is captured instead of delivered. Read it at{" "}
            <a href={mailPreviewHref}>{mailPreviewHref}</a>.
          </p>
        )}
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      {formError && (
        <Notice tone="caution" role="alert">
          {formError}
        </Notice>
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
        autoComplete="new-password"
        hint="At least 10 characters. A few unrelated words make a good one."
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" pending={pending}>
        Open my account
      </Button>
    </form>
  );
}
