"use client";

import { useState } from "react";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { notificationsInput } from "@/lib/validation/proposals";

/** Whether Understudy e-mails the member about their proposals (and reviewers their summary); saved at once. */
export function NotificationsToggle({ initial, reviewer }: { initial: boolean; reviewer: boolean }) {
  const [saved, setSaved] = useState(false);
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: notificationsInput,
    endpoint: "/api/account",
    method: "PATCH",
    defaultValues: { notifyByEmail: initial },
    onSuccess: () => setSaved(true),
    onError: () => {
      form.setValue("notifyByEmail", !form.getValues("notifyByEmail"));
      return false;
    },
  });
  const field = form.register("notifyByEmail");
  return (
    <form className="space-y-1" onSubmit={onSubmit} noValidate>
      <label className="flex cursor-pointer items-start gap-3">
        <input
          type="checkbox"
          disabled={pending}
          className="mt-1 h-5 w-5 accent-brass"
          {...field}
          onChange={async (e) => {
            setSaved(false);
            await field.onChange(e);
            await onSubmit();
          }}
        />
        <span>
          <span className="font-bold">E-mail me about my proposals</span>
          <span className="block text-sm text-ink-soft">
            When a moderator approves, rejects or sends back a cross you proposed
            {reviewer ? ", and a summary of new proposals to review" : ""}. Messages about your account itself
            (password, address) are always sent.
          </span>
        </span>
      </label>
      <p className="text-sm text-ink-soft" role="status">
        {pending ? "Saving…" : formError ? `Not saved: ${formError}` : saved ? "Saved." : ""}
      </p>
    </form>
  );
}
