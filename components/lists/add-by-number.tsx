"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import type { NumberChoice } from "@/lib/lists/lists";
import { addByNumberForm } from "@/lib/validation/lists";

export type Added = { superseded: boolean; merged: boolean; read: string | null; latestNumber: string | null };

/** What the list says after an add: what the number was read as, and whether it was superseded or merged. */
export function addedText(added: Added): string {
  const readAs = added.read ? `Read as ${added.read}. ` : "";
  const what = added.merged
    ? "Already on the list: its quantity was raised."
    : added.superseded
      ? `That number is superseded: added as ${added.latestNumber}.`
      : "Added.";
  return `${readAs}${what}`;
}

/**
 * "Add a part by factory number": a number with a misread character is taken (the answer says what it was read as);
 * several parts, or only similar numbers, come back as choices for the list to offer as buttons.
 */
export function AddByNumber({
  listId,
  onAdded,
  onChoices,
  onOffline,
}: {
  listId: number;
  onAdded: (text: string) => void;
  onChoices: (text: string, choices: NumberChoice[], quantity: number) => void;
  /** Keeps the line to add when the connection returns. */
  onOffline: (number: string, quantity: number) => Promise<void>;
}) {
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: addByNumberForm,
    endpoint: `/api/lists/${listId}/lines`,
    defaultValues: { number: "", quantity: "1" },
    onSuccess: (data: Added) => {
      form.reset();
      onAdded(addedText(data));
    },
    whenOffline: async (values) => {
      await onOffline(values.number, values.quantity);
      form.reset();
    },
    onError: (error) => {
      const choices = error.field === "number" ? (error.choices as NumberChoice[] | undefined) : undefined;
      if (!choices?.length) return false;
      onChoices(error.message, choices, Number(form.getValues("quantity")) || 1);
      return true;
    },
  });
  const errors = form.formState.errors;
  return (
    <form
      className="flex flex-wrap items-start gap-3 rounded-lg border border-rule bg-ground-raised p-4"
      onSubmit={onSubmit}
      noValidate
    >
      <div className="min-w-56 flex-1">
        <Field
          id="add-number"
          label="Add a part by factory number"
          mono
          error={errors.number?.message ?? formError ?? undefined}
          {...form.register("number")}
        />
      </div>
      <div className="w-24">
        <Field
          id="add-quantity"
          label="Qty"
          inputMode="numeric"
          mono
          error={errors.quantity?.message}
          {...form.register("quantity")}
        />
      </div>
      <Button type="submit" pending={pending} className="mt-8">
        Add
      </Button>
    </form>
  );
}
