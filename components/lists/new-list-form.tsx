"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { postJson } from "@/lib/http/post-json";

/** A new job list: a title that says the job, and the machine if it is for one. */
export function NewListForm({ machines }: { machines: Array<{ id: number; label: string }> }) {
  const router = useRouter();
  const [title, setTitle] = useState("");
  const [machineId, setMachineId] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="space-y-4 rounded-lg border border-rule bg-ground-raised p-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        const result = await postJson<{ id: number }>("/api/lists", {
          title,
          machineId: machineId ? Number(machineId) : null,
        });
        setBusy(false);
        if (result.ok) router.push(`/lists/${result.data.id}`);
        else setError(result.error.message);
      }}
    >
      <h2 className="text-xl">Start a list for a job</h2>
      <Field
        id="list-title"
        label="What is the job?"
        hint="For example: water pump rebuild, customer's 1948 crawler."
        value={title}
        onChange={(e) => setTitle(e.target.value)}
        error={error ?? undefined}
      />
      <SelectField
        id="list-machine"
        label="Machine (optional)"
        value={machineId}
        onChange={(e) => setMachineId(e.target.value)}
      >
        <option value="">Not for one machine</option>
        {machines.map((m) => (
          <option key={m.id} value={m.id}>
            {m.label}
          </option>
        ))}
      </SelectField>
      <Button type="submit" pending={busy}>
        Start the list
      </Button>
    </form>
  );
}
