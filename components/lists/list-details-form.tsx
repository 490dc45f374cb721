"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { sendJson } from "@/lib/http/post-json";

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
  const [values, setValues] = useState({
    title,
    machineId: machineId ? String(machineId) : "",
    machineSerial: machineSerial ?? "",
    notes: notes ?? "",
  });
  const [state, setState] = useState<{ busy: boolean; error: string | null; field: string | null; saved: boolean }>({
    busy: false,
    error: null,
    field: null,
    saved: false,
  });
  return (
    <details className="no-print rounded-lg border border-rule bg-ground-raised p-4">
      <summary className="cursor-pointer font-bold">Change the title, machine, serial or notes</summary>
      <form
        className="mt-3 space-y-3"
        onSubmit={async (e) => {
          e.preventDefault();
          setState({ busy: true, error: null, field: null, saved: false });
          const result = await sendJson("PATCH", `/api/lists/${id}`, {
            title: values.title,
            machineId: values.machineId ? Number(values.machineId) : null,
            machineSerial: values.machineId ? values.machineSerial : null,
            notes: values.notes,
          });
          setState({
            busy: false,
            error: result.ok ? null : result.error.message,
            field: result.ok ? null : (result.error.field ?? null),
            saved: result.ok,
          });
          if (result.ok) router.refresh();
        }}
      >
        <Field
          id="edit-title"
          label="What is the job?"
          value={values.title}
          onChange={(e) => setValues({ ...values, title: e.target.value })}
          error={state.field !== "machineSerial" ? (state.error ?? undefined) : undefined}
        />
        <SelectField
          id="edit-machine"
          label="Machine"
          value={values.machineId}
          onChange={(e) => setValues({ ...values, machineId: e.target.value })}
        >
          <option value="">Not for one machine</option>
          {machines.map((m) => (
            <option key={m.id} value={m.id}>
              {m.label}
            </option>
          ))}
        </SelectField>
        {values.machineId && (
          <Field
            id="edit-serial"
            label="Serial number (optional)"
            hint="As on the machine's plate. With it, “Add the rest of the assembly” picks the parts for that serial."
            value={values.machineSerial}
            onChange={(e) => setValues({ ...values, machineSerial: e.target.value })}
            error={state.field === "machineSerial" ? (state.error ?? undefined) : undefined}
            mono
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
            value={values.notes}
            onChange={(e) => setValues({ ...values, notes: e.target.value })}
            className="block w-full rounded-md border-2 border-rule-strong bg-ground px-3 py-2"
          />
        </div>
        <div className="flex items-center gap-3">
          <Button type="submit" variant="secondary" pending={state.busy}>
            Save
          </Button>
          {state.saved && <span role="status">Saved.</span>}
        </div>
      </form>
    </details>
  );
}
