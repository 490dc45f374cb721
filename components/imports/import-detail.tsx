"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { IMPORT_FIELDS, STATUS_WORDS, TARGET_WORDS, type ImportCounts } from "@/lib/imports/kinds";
import type { ImportView } from "@/lib/imports/imports";
import { Field } from "@/components/ui/field";
import { useApiAction } from "@/lib/hooks/use-api-action";
import { useApiForm } from "@/lib/hooks/use-api-form";
import { useImport, useImportRows } from "@/lib/hooks/use-import";
import { mappingBody, savedMappingBody } from "@/lib/validation/imports";

function Progress({ view }: { view: ImportView }) {
  const p = view.progress;
  const share = p && p.totalBytes > 0 ? Math.min(1, p.bytes / p.totalBytes) : 0;
  const label = view.status === "committing" ? "Committing" : "Reading the file";
  return (
    <div className="space-y-2" aria-live="polite">
      <p className="font-bold">
        {label}… {p ? `${p.rows.toLocaleString("en-GB")} rows` : ""}
      </p>
      <div className="h-4 w-full overflow-hidden rounded-full border border-rule-strong bg-ground-sunk">
        <div
          role="progressbar"
          aria-label={label}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={Math.round(share * 100)}
          className="h-full bg-brass transition-all"
          style={{ width: `${Math.max(3, share * 100)}%` }}
        />
      </div>
    </div>
  );
}

const COUNT_WORDS: Array<[Exclude<keyof ImportCounts, "newMakerNames" | "newStandardPartNames">, string]> = [
  ["newParts", "new parts"],
  ["newCrosses", "new crosses"],
  ["updates", "updates"],
  ["unchanged", "unchanged"],
  ["rejected", "rejected"],
  ["newMakers", "new makers"],
  ["newStandardParts", "new standard parts"],
];

function Counts({ counts, target, title }: { counts: ImportCounts; target: ImportView["target"]; title: string }) {
  return (
    <section aria-label={title} className="space-y-2">
      <h2 className="text-xl">{title}</h2>
      <p className="text-ink-soft">{counts.rows.toLocaleString("en-GB")} rows read.</p>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="import-counts">
        {COUNT_WORDS.map(([key, word]) => (
          <div
            key={key}
            className={`rounded-md border p-3 ${
              key === "rejected" && counts.rejected > 0
                ? "border-caution bg-caution-wash"
                : "border-rule bg-ground-raised"
            }`}
          >
            <dt className="text-sm">{target === "review_queue" && key === "newCrosses" ? "new proposals" : word}</dt>
            <dd className="num text-2xl font-bold" data-count={key}>
              {counts[key].toLocaleString("en-GB")}
            </dd>
          </div>
        ))}
      </dl>
      <NewNames title="New makers" names={counts.newMakerNames} total={counts.newMakers} />
      <NewNames title="New standard parts" names={counts.newStandardPartNames} total={counts.newStandardParts} />
      {target === "catalogue" && (
        <p className="text-sm text-ink-soft">
          No machines are added by an import: rows naming a machine the catalogue lacks are rejected.
        </p>
      )}
    </section>
  );
}

/** The names behind a count, so an admin can spot a misspelt maker before it becomes a second maker. */
function NewNames({ title, names = [], total }: { title: string; names?: string[]; total: number }) {
  if (total === 0) return null;
  return (
    <div className="text-sm">
      <h3 className="font-bold">{title}</h3>
      <ul className="flex flex-wrap gap-2" data-testid={`names-${title.toLowerCase().replace(/\s+/g, "-")}`}>
        {names.map((n) => (
          <li key={n} className="rounded border border-rule bg-ground-raised px-2 py-0.5 num">
            {n}
          </li>
        ))}
      </ul>
      {total > names.length && (
        <p className="text-ink-soft">and {(total - names.length).toLocaleString("en-GB")} more.</p>
      )}
    </div>
  );
}

const columnOrNull = (value: unknown) => (value ? String(value) : null);

/** The columns of the file each field is read from: correct them and run the dry run again, or save them by name. */
function MappingEditor({ view, onSaved }: { view: ImportView; onSaved: () => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const rerun = useApiForm({
    schema: mappingBody,
    endpoint: `/api/imports/${view.id}`,
    method: "PATCH",
    defaultValues: { mapping: view.mapping as Record<string, string | null> },
    onSuccess: onSaved,
  });
  const save = useApiForm({
    schema: savedMappingBody,
    endpoint: "/api/import-mappings",
    toBody: (v) => ({ name: v.name, mapping: rerun.form.getValues("mapping") }),
    defaultValues: { name: "", mapping: {} },
    onSuccess: (data: { name: string }) =>
      setMessage(`Saved as “${data.name}”; choose it when you import the next file from the same source.`),
  });
  const mapping = rerun.form.watch("mapping");
  return (
    <section aria-labelledby="mapping-heading" className="space-y-3 rounded-lg border border-rule bg-ground-raised p-4">
      <h2 id="mapping-heading" className="text-xl">
        Columns
      </h2>
      <p className="text-sm text-ink-soft">
        Each field of the catalogue and the column of your file it is read from. Fields marked * are needed. Change any
        that are wrong and run the dry run again.
      </p>
      <form onSubmit={rerun.onSubmit} noValidate className="space-y-3">
        {rerun.formError && (
          <Notice tone="caution" role="alert">
            {rerun.formError}
          </Notice>
        )}
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {IMPORT_FIELDS.map((f) => (
            <div key={f.key} className="space-y-1">
              <label htmlFor={`map-${f.key}`} className="block text-sm font-bold">
                {f.label}
                {f.required ? " *" : ""}
              </label>
              <select
                id={`map-${f.key}`}
                className={`block min-h-11 w-full rounded-md border-2 bg-ground px-2 ${
                  f.required && !mapping[f.key] ? "border-caution" : "border-rule-strong"
                }`}
                {...rerun.form.register(`mapping.${f.key}`, { setValueAs: columnOrNull })}
              >
                <option value="">(not in this file)</option>
                {view.headers.filter(Boolean).map((h) => (
                  <option key={h} value={h}>
                    {h}
                  </option>
                ))}
              </select>
            </div>
          ))}
        </div>
        <Button type="submit" variant="secondary" pending={rerun.pending}>
          Run the dry run again
        </Button>
      </form>
      <form onSubmit={save.onSubmit} noValidate className="flex flex-wrap items-start gap-3">
        <Field
          id="mapping-name"
          label="Save this mapping as"
          placeholder="e.g. club list 1962"
          error={save.form.formState.errors.name?.message ?? save.formError ?? undefined}
          {...save.form.register("name")}
        />
        <Button type="submit" variant="secondary" pending={save.pending} className="mt-8">
          Save
        </Button>
      </form>
      {message && <p role="status">{message}</p>}
    </section>
  );
}

const TABLE_WORDS: Record<string, string> = {
  original_parts: "part",
  crosses: "cross",
  standard_parts: "standard part",
  makers: "maker",
  part_usages: "where used",
  proposals: "proposal",
};

/** What a committed import wrote, by file line, with links to what can be opened. */
function WrittenRows({ id }: { id: number }) {
  const data = useImportRows(id);
  if (!data || data.total === 0) return null;
  return (
    <details className="rounded-lg border border-rule bg-ground-raised p-4">
      <summary className="cursor-pointer font-bold">
        What it wrote: {data.total.toLocaleString("en-GB")} records, by line of the file
      </summary>
      {data.total > data.changes.length && (
        <p className="text-sm text-ink-soft">The first {data.changes.length} are listed.</p>
      )}
      <ul className="mt-2 columns-1 text-sm sm:columns-2">
        {data.changes.map((c) => (
          <li key={`${c.table}-${c.recordId}-${c.action}`}>
            line <span className="num">{c.line}</span>: {c.action === "insert" ? "added" : "changed"}{" "}
            {TABLE_WORDS[c.table] ?? c.table}{" "}
            {c.table === "original_parts" ? <Link href={`/parts/${c.recordId}`}>#{c.recordId}</Link> : `#${c.recordId}`}
          </li>
        ))}
      </ul>
    </details>
  );
}

/** One import: progress while the server works, then the dry run to check, commit, and roll back. */
export function ImportDetail({ initial, isAdmin }: { initial: ImportView; isAdmin: boolean }) {
  const { view, busy: busyOnServer, mutate } = useImport(initial);
  const action = useApiAction();
  const router = useRouter();
  const error = action.error?.message ?? null;
  const busy = action.pending;
  const mayCommit = view.target === "review_queue" || isAdmin;

  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <p>
          <Link href="/admin/imports">← All imports</Link>
        </p>
        <h1 className="text-3xl break-all">{view.fileName}</h1>
        <p className="text-ink-soft">
          {STATUS_WORDS[view.status]} · into {TARGET_WORDS[view.target]} · {(view.sizeBytes / 1024).toFixed(0)} KB
          {view.encoding
            ? `, ${view.encoding}, “${view.delimiter === "\t" ? "tab" : view.delimiter}” between columns`
            : ""}{" "}
          · sent by {view.by ?? "?"} on {new Date(view.createdAt).toUTCString().slice(0, 22)}
        </p>
        <p className="text-sm text-ink-soft">
          The original file is kept as it was sent, so what the import did can be checked against it later.
        </p>
      </header>

      {busyOnServer && <Progress view={view} />}
      {view.errorMessage && (
        <Notice tone="caution" role="alert">
          {view.errorMessage}
        </Notice>
      )}
      {error && (
        <Notice tone="caution" role="alert">
          {error}
        </Notice>
      )}

      {view.status === "rolled_back" && (
        <Notice tone="caution" role="status">
          Rolled back on {new Date(view.rolledBackAt ?? view.createdAt).toUTCString().slice(0, 22)}: everything this
          import added was removed and everything it changed was put back. The figures below are what the commit had
          done.
        </Notice>
      )}
      {view.committedCounts && (
        <Counts counts={view.committedCounts} target={view.target} title="What the commit did" />
      )}
      {!view.committedCounts && view.counts && (
        <Counts counts={view.counts} target={view.target} title="Dry run: what a commit would do" />
      )}

      {view.status === "parsed" && view.counts && mayCommit && (
        <div className="flex flex-wrap items-center gap-4 rounded-lg border-2 border-brass bg-ground-raised p-4">
          <p className="flex-1">
            {view.target === "catalogue"
              ? "Committing writes every accepted row in one go: all of them, or, if " +
                "anything fails, none. Rejected rows are left out."
              : "Committing puts every accepted row in the review queue as a proposal for another moderator to decide."}
          </p>
          <Button
            type="button"
            pending={busy}
            onClick={async () => {
              if (await action.run("POST", `/api/imports/${view.id}/commit`, {})) await mutate();
            }}
          >
            Commit {(view.counts.rows - view.counts.rejected).toLocaleString("en-GB")} rows
          </Button>
        </div>
      )}

      {!view.committedAt && !busyOnServer && (
        <p>
          <button
            type="button"
            className="underline"
            onClick={async () => {
              if (
                !window.confirm(
                  "Discard this import? Its dry run, rejected rows and the file are " +
                    "thrown away; the catalogue is not touched.",
                )
              )
                return;
              const result = await action.run("DELETE", `/api/imports/${view.id}`);
              if (result?.ok) router.push("/admin/imports?discarded=1");
            }}
          >
            Discard this import
          </button>
        </p>
      )}

      {view.status === "committed" && <WrittenRows id={view.id} />}

      {view.status === "committed" && (
        <div className="flex flex-wrap items-center gap-4">
          {isAdmin && (
            <Button
              type="button"
              variant="secondary"
              pending={busy}
              onClick={async () => {
                if (
                  !window.confirm(
                    "Roll back this whole import? Everything it added is removed and " +
                      "everything it changed is put back.",
                  )
                )
                  return;
                if (await action.run("POST", `/api/imports/${view.id}/rollback`, {})) await mutate();
              }}
            >
              Roll back this import
            </Button>
          )}
        </div>
      )}

      {!view.committedAt && view.headers.length > 0 && !busyOnServer && (
        <MappingEditor key={JSON.stringify(view.mapping)} view={view} onSaved={() => void mutate()} />
      )}

      {view.rejectionsTotal > 0 && (
        <section aria-labelledby="rejected-heading" className="space-y-2">
          <div className="flex flex-wrap items-baseline justify-between gap-3">
            <h2 id="rejected-heading" className="text-xl">
              Rejected rows ({view.rejectionsTotal.toLocaleString("en-GB")})
            </h2>
            <a href={`/api/imports/${view.id}/rejected.csv`} download>
              Download the rejected rows (CSV)
            </a>
          </div>
          {view.rejectionsTotal > view.rejections.length && (
            <p className="text-sm text-ink-soft">
              The first {view.rejections.length} are shown; the download has them all.
            </p>
          )}
          <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
            <table className="stack-table w-full text-left text-sm">
              <thead className="bg-ground-sunk">
                <tr>
                  <th scope="col" className="p-2">
                    Line
                  </th>
                  <th scope="col" className="p-2">
                    Column
                  </th>
                  <th scope="col" className="p-2">
                    Reason
                  </th>
                </tr>
              </thead>
              <tbody>
                {view.rejections.map((r) => (
                  <tr
                    key={`${r.line}-${r.column}`}
                    className="border-t border-rule align-top"
                    data-testid="rejected-row"
                  >
                    <td className="p-2 num" data-label="Line">
                      {r.line}
                    </td>
                    <td className="p-2" data-label="Column">
                      {r.column ?? "—"}
                    </td>
                    <td className="col-span-2 p-2" data-label="Reason">
                      {r.reason}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </section>
      )}
    </div>
  );
}
