"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { listPatch } from "@/lib/validation/lists";

const idOrNull = (value: unknown) => (value ? Number(value) : null);

/** Renames the job, changes its machine, the machine's serial or the notes. */
export function ListDetailsForm({
  id,
  title,
  machineId,
  machineSerial,
  notes,
  machines,
}: {
  id: number;
  title: string;
  machineId: number | null;
  machineSerial: string | null;
  notes: string | null;
  machines: Array<{ id: number; label: string }>;
}) {
  const router = useRouter();
  const [saved, setSaved] = useState(false);
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: listPatch,
    endpoint: `/api/lists/${id}`,
    method: "PATCH",
    defaultValues: { title, machineId, machineSerial: machineSerial ?? "", notes: notes ?? "" },
    onSuccess: () => {
      setSaved(true);
      router.refresh();
    },
  });
  const errors = form.formState.errors;
  const hasMachine = Boolean(form.watch("machineId"));
  return (
    <details className="no-print rounded-lg border border-rule bg-ground-raised p-4">
      <summary className="cursor-pointer font-bold">Change the title, machine, serial or notes</summary>
      <form className="mt-3 space-y-3" onSubmit={onSubmit} onChange={() => setSaved(false)} noValidate>
        {formError && (
          <Notice tone="caution" role="alert">
            {formError}
          </Notice>
        )}
        <Field id="edit-title" label="What is the job?" error={errors.title?.message} {...form.register("title")} />
        <SelectField
          id="edit-machine"
          label="Machine"
          error={errors.machineId?.message}
          {...form.register("machineId", { setValueAs: idOrNull })}
        >
          <option value="">Not for one machine</option>
          {machines.map((m) => (
            <option key={m.id} value={m.id}>
              {m.label}
            </option>
          ))}
        </SelectField>
        {hasMachine && (
          <Field
            id="edit-serial"
            label="Serial number (optional)"
            hint="As on the machine's plate. With it, “Add the rest of the assembly” picks the parts for that serial."
            error={errors.machineSerial?.message}
            mono
            {...form.register("machineSerial")}
          />
        )}
        <div className="space-y-1">
          <label htmlFor="edit-notes" className="block font-bold">
            Notes for the job
          </label>
          <textarea
            id="edit-notes"
            rows={3}
            maxLength={2000}
            className="block w-full rounded-md border-2 border-rule-strong bg-ground px-3 py-2"
            {...form.register("notes")}
          />
        </div>
        <div className="flex items-center gap-3">
          <Button type="submit" variant="secondary" pending={pending}>
            Save
          </Button>
          {saved && <span role="status">Saved.</span>}
        </div>
      </form>
    </details>
  );
}
