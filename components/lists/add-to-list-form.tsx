"use client";

import Link from "next/link";
import { useEffect, useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { useLists } from "@/lib/hooks/use-lists";
import type { ListItem } from "@/components/lists/add-to-list";
import { addToListForm } from "@/lib/validation/lists";

type Added = { merged: boolean; superseded: boolean };

/**
 * Puts this part on one of the member's job lists (or a new one), in one request either way. Loaded only when a
 * person asks to add, so the pages that offer it do not carry the form and its checks on first load.
 */
export function AddToListForm({ item, number, onClose }: { item: ListItem; number: string; onClose: () => void }) {
  const { lists, loaded, revalidate } = useLists(true);
  const [done, setDone] = useState<{ id: number; text: string } | null>(null);
  const id = useId();
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: addToListForm,
    endpoint: (v) => (v.list === "new" ? "/api/lists" : `/api/lists/${v.list}/lines`),
    toBody: (v) =>
      v.list === "new"
        ? { title: v.title, firstLine: { ...item, quantity: v.quantity } }
        : { ...item, quantity: v.quantity },
    defaultValues: { list: "", title: "", quantity: "1" },
    onSuccess: (data: ({ id: number; line: Added } | Added) & { lineId?: number }, v) => {
      const added = "line" in data ? data.line : data;
      const listId = "line" in data ? data.id : Number(v.list);
      void revalidate();
      const text = added.merged
        ? `${number} was already on the list; quantity raised.`
        : added.superseded
          ? `Added under ${number}'s latest number.`
          : `${number} added.`;
      setDone({ id: listId, text });
    },
  });

  // Once the member's lists have come, the first is chosen (or "a new list" when there are none).
  useEffect(() => {
    if (loaded && !form.getValues("list")) form.setValue("list", lists[0] ? String(lists[0].id) : "new");
  }, [loaded, lists, form]);

  if (done) {
    return (
      <p className="text-sm" role="status">
        ✓ {done.text} <Link href={`/lists/${done.id}`}>Open the list</Link>
      </p>
    );
  }
  const errors = form.formState.errors;
  const chosen = form.watch("list");
  return (
    <form
      className="flex flex-wrap items-end gap-2 rounded-md border border-rule bg-ground p-2"
      onSubmit={onSubmit}
      noValidate
    >
      <div>
        <label htmlFor={`${id}-list`} className="block text-sm font-bold">
          List
        </label>
        <select
          id={`${id}-list`}
          className="min-h-10 max-w-56 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
          {...form.register("list")}
        >
          {lists.map((l) => (
            <option key={l.id} value={l.id}>
              {l.title}
            </option>
          ))}
          <option value="new">A new list…</option>
        </select>
      </div>
      {chosen === "new" && (
        <div>
          <label htmlFor={`${id}-title`} className="block text-sm font-bold">
            New list&apos;s title
          </label>
          <input
            id={`${id}-title`}
            aria-invalid={errors.title ? true : undefined}
            aria-describedby={errors.title ? `${id}-title-error` : undefined}
            className="min-h-10 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
            {...form.register("title")}
          />
          {errors.title?.message && <FieldError id={`${id}-title-error`}>{errors.title.message}</FieldError>}
        </div>
      )}
      <div>
        <label htmlFor={`${id}-qty`} className="block text-sm font-bold">
          Qty
        </label>
        <input
          id={`${id}-qty`}
          inputMode="numeric"
          aria-invalid={errors.quantity ? true : undefined}
          aria-describedby={errors.quantity ? `${id}-qty-error` : undefined}
          className="min-h-10 w-16 rounded-md border-2 border-rule-strong bg-ground-raised px-2 num"
          {...form.register("quantity")}
        />
        {errors.quantity?.message && <FieldError id={`${id}-qty-error`}>{errors.quantity.message}</FieldError>}
      </div>
      <Button type="submit" pending={pending} className="min-h-10 px-3 py-1">
        Add
      </Button>
      <button type="button" className="min-h-10 text-sm underline" onClick={onClose}>
        Cancel
      </button>
      {formError && (
        <p className="w-full text-sm font-bold text-caution" role="alert">
          {formError}
        </p>
      )}
    </form>
  );
}
