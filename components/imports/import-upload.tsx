"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useDropzone } from "react-dropzone";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { IMPORT_MAX_BYTES, type ImportTarget } from "@/lib/imports/kinds";

/** Drop a CSV: it is sent as it is, stored, and the dry run starts on the server; the page for it opens. */
export function ImportUpload({
  canCommitToCatalogue,
  mappings,
}: {
  canCommitToCatalogue: boolean;
  mappings: Array<{ id: number; name: string }>;
}) {
  const router = useRouter();
  const [target, setTarget] = useState<ImportTarget>(canCommitToCatalogue ? "catalogue" : "review_queue");
  const [mappingId, setMappingId] = useState("");
  const [state, setState] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });

  async function send(file: File) {
    setState({ busy: true, error: null });
    const form = new FormData();
    form.set("file", file);
    form.set("target", target);
    if (mappingId) form.set("mappingId", mappingId);
    try {
      const response = await fetch("/api/imports", { method: "POST", body: form });
      const body = await response.json().catch(() => ({}));
      if (!response.ok) return setState({ busy: false, error: body.message ?? "The file could not be sent." });
      router.push(`/admin/imports/${body.id}`);
    } catch {
      setState({ busy: false, error: "No connection to Understudy. Check your network and try again." });
    }
  }

  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: { "text/csv": [".csv"], "text/plain": [".csv", ".txt"], "application/vnd.ms-excel": [".csv"] },
    maxFiles: 1,
    maxSize: IMPORT_MAX_BYTES,
    disabled: state.busy,
    onDrop: (accepted, rejected) => {
      if (rejected.length > 0) {
        const code = rejected[0].errors[0]?.code;
        setState({
          busy: false,
          error:
            code === "file-too-large"
              ? `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB.`
              : "Choose one CSV file (saved from a spreadsheet as CSV).",
        });
        return;
      }
      if (accepted[0]) void send(accepted[0]);
    },
  });

  return (
    <section aria-labelledby="upload-heading" className="space-y-4 rounded-lg border border-rule bg-ground-raised p-4">
      <h2 id="upload-heading" className="text-2xl">
        Import a spreadsheet
      </h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          id="target"
          label="Into"
          value={target}
          onChange={(e) => setTarget(e.target.value as ImportTarget)}
        >
          {canCommitToCatalogue && <option value="catalogue">The catalogue (approved crosses)</option>}
          <option value="review_queue">The review queue (proposals for moderators)</option>
        </SelectField>
        <SelectField
          id="mapping"
          label="Column mapping"
          value={mappingId}
          onChange={(e) => setMappingId(e.target.value)}
        >
          <option value="">Match the columns by their titles</option>
          {mappings.map((m) => (
            <option key={m.id} value={m.id}>
              Saved: {m.name}
            </option>
          ))}
        </SelectField>
      </div>
      <div
        {...getRootProps({
          className:
            `flex min-h-36 cursor-pointer flex-col items-center justify-center ` +
            `gap-1 rounded-lg border-2 border-dashed p-4 text-center ` +
            `${isDragActive ? "border-brass bg-brass-wash" : "border-rule-strong bg-ground"}`,
        })}
        data-testid="import-drop"
      >
        <input {...getInputProps({ "aria-label": "Choose a CSV file" })} />
        <p className="font-bold">
          {state.busy ? "Sending and storing the file…" : "Drop a CSV file here, or click to choose it"}
        </p>
        <p className="text-sm text-ink-soft">
          UTF-8 or Windows-1252, commas or semicolons, a title row first; up to {IMPORT_MAX_BYTES / 1024 / 1024} MB.
          Nothing changes until you have seen the dry run and commit it.
        </p>
      </div>
      {state.error && (
        <Notice tone="caution" role="alert">
          {state.error}
        </Notice>
      )}
      <p className="text-sm">
        The columns and their meaning: <a href="/import-format">the import format</a>, with a{" "}
        <a href="/import-format/sample.csv">sample file</a>.
      </p>
    </section>
  );
}
