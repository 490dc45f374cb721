"use client";

import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { listInput } from "@/lib/validation/lists";

const idOrNull = (value: unknown) => (value ? Number(value) : null);

/** A new job list: a title that says the job, and the machine if it is for one. */
export function NewListForm({ machines }: { machines: Array<{ id: number; label: string }> }) {
  const router = useRouter();
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: listInput,
    endpoint: "/api/lists",
    defaultValues: { title: "", machineId: null },
    onSuccess: (data: { id: number }) => router.push(`/lists/${data.id}`),
  });
  const errors = form.formState.errors;
  return (
    <form className="space-y-4 rounded-lg border border-rule bg-ground-raised p-4" onSubmit={onSubmit} noValidate>
      <h2 className="text-xl">Start a list for a job</h2>
      {formError && (
        <Notice tone="caution" role="alert">
          {formError}
        </Notice>
      )}
      <Field
        id="list-title"
        label="What is the job?"
        hint="For example: water pump rebuild, customer's 1948 crawler."
        error={errors.title?.message}
        {...form.register("title")}
      />
      <SelectField
        id="list-machine"
        label="Machine (optional)"
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
      <Button type="submit" pending={pending}>
        Start the list
      </Button>
    </form>
  );
}
