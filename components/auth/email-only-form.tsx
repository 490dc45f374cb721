"use client";

import { useState } from "react";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { emailOnlyBody, type EmailOnlyBody } from "@/lib/validation/auth";

/** Asks for one e-mail address and posts it: "forgotten password" and "send the confirmation link again". */
export function EmailOnlyForm({
  endpoint,
  submitLabel,
  defaultEmail = "",
  hideEmail = false,
}: {
  endpoint: string;
  submitLabel: string;
  defaultEmail?: string;
  hideEmail?: boolean;
}) {
  const [done, setDone] = useState<string | null>(null);
  const { form, onSubmit, formError, pending } = useApiForm<EmailOnlyBody, EmailOnlyBody, { message: string }>({
    schema: emailOnlyBody,
    endpoint,
    defaultValues: { email: defaultEmail },
    onSuccess: (data) => setDone(data.message),
  });

  if (done) {
    return (
      <Notice tone="success" role="status">
        {done}
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && (
        <Notice tone="caution" role="alert">
          {formError}
        </Notice>
      )}
      {hideEmail ? (
        <input type="hidden" {...form.register("email")} />
      ) : (
        <Field
          id="email"
          label="E-mail"
          type="email"
          autoComplete="email"
          error={form.formState.errors.email?.message}
          {...form.register("email")}
        />
      )}
      <Button type="submit" pending={pending} variant={hideEmail ? "secondary" : "primary"}>
        {submitLabel}
      </Button>
    </form>
  );
}
