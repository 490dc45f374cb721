"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { confirmationInput } from "@/lib/validation/proposals";

/** "I fitted this too": a member's confirmation, with an optional note, counted once per member. */
export function ConfirmButton({ crossId, signedIn }: { crossId: number; signedIn: boolean }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState(false);
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: confirmationInput,
    endpoint: `/api/crosses/${crossId}/confirmations`,
    defaultValues: { note: "" },
    onSuccess: () => {
      setDone(true);
      router.refresh();
    },
  });

  if (!signedIn) {
    return (
      <p className="text-sm">
        <Link href="/sign-in">Sign in</Link> to say you fitted this too.
      </p>
    );
  }
  if (done) {
    return (
      <p className="text-sm font-bold" role="status">
        ✓ Thank you: your confirmation is counted.
      </p>
    );
  }
  if (!open) {
    return (
      <button type="button" className="text-sm font-bold underline" onClick={() => setOpen(true)}>
        I fitted this too
      </button>
    );
  }
  return (
    <form className="space-y-2" onSubmit={onSubmit} noValidate>
      <Field
        id={`confirm-note-${crossId}`}
        label="A note for others (optional)"
        maxLength={500}
        placeholder="e.g. fitted 2021, 300 hours since"
        error={form.formState.errors.note?.message ?? formError ?? undefined}
        {...form.register("note")}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" pending={pending}>
          Confirm
        </Button>
        <button type="button" className="text-sm underline" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
