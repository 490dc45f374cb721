"use client";

import Link from "next/link";
import { useState } from "react";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { resetPasswordBody, type ResetPasswordBody } from "@/lib/validation/auth";

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const { form, onSubmit, formError, pending } = useApiForm<ResetPasswordBody, ResetPasswordBody, { message: string }>({
    schema: resetPasswordBody,
    endpoint: "/api/auth/password-reset/confirm",
    defaultValues: { token, password: "" },
    onSuccess: (data) => setDone(data.message),
  });

  if (done) {
    return (
      <Notice tone="success" role="status">
        {done} <Link href="/sign-in">Sign in</Link>
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      {(formError || form.formState.errors.token) && (
        <Notice tone="caution" role="alert">
          {formError ?? form.formState.errors.token?.message} <Link href="/forgot-password">Ask for a new link</Link>
        </Notice>
      )}
      <input type="hidden" {...form.register("token")} />
      <Field
        id="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={form.formState.errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" pending={pending}>
        Set my new password
      </Button>
    </form>
  );
}
