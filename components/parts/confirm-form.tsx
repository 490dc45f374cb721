"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { confirmationInput } from "@/lib/validation/proposals";

/**
 * A member's confirmation of a cross, with an optional note. Loaded only when a member opens it, so the part page
 * does not carry the form and its checks on first load.
 */
export function ConfirmForm({ crossId, onClose }: { crossId: number; onClose: () => void }) {
  const router = useRouter();
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

  if (done) {
    return (
      <p className="text-sm font-bold" role="status">
        ✓ Thank you: your confirmation is counted.
      </p>
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
        <button type="button" className="text-sm underline" onClick={onClose}>
          Cancel
        </button>
      </div>
    </form>
  );
}
