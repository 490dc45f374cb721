"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import {
  IMPORT_FIELDS,
  STATUS_WORDS,
  TARGET_WORDS,
  type ImportCounts,
  type ImportMappingValue,
} from "@/lib/imports/kinds";
import type { ImportView } from "@/lib/imports/imports";
import { sendJson } from "@/lib/http/post-json";

const BUSY = ["uploaded", "parsing", "committing"];

async function fetchImport(url: string): Promise<ImportView> {
  const response = await fetch(url);
  if (!response.ok)
    throw new Error((await response.json().catch(() => ({}))).message ?? "The import could not be loaded.");
  return response.json();
}

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

function MappingEditor({ view, onSaved }: { view: ImportView; onSaved: () => void }) {
  const [mapping, setMapping] = useState<ImportMappingValue>(view.mapping);
  const [name, setName] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <section aria-labelledby="mapping-heading" className="space-y-3 rounded-lg border border-rule bg-ground-raised p-4">
      <h2 id="mapping-heading" className="text-xl">
        Columns
      </h2>
      <p className="text-sm text-ink-soft">
        Each field of the catalogue and the column of your file it is read from. Fields marked * are needed. Change any
        that are wrong and run the dry run again.
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {IMPORT_FIELDS.map((f) => (
          <div key={f.key} className="space-y-1">
            <label htmlFor={`map-${f.key}`} className="block text-sm font-bold">
              {f.label}
              {f.required ? " *" : ""}
            </label>
            <select
              id={`map-${f.key}`}
              value={mapping[f.key] ?? ""}
              onChange={(e) => setMapping({ ...mapping, [f.key]: e.target.value || null })}
              className={
                `block min-h-11 w-full rounded-md border-2 bg-ground px-2 ` +
                `${f.required && !mapping[f.key] ? "border-caution" : "border-rule-strong"}`
              }
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
      <div className="flex flex-wrap items-end gap-3">
        <Button
          type="button"
          variant="secondary"
          pending={busy}
          onClick={async () => {
            setBusy(true);
            const result = await sendJson("PATCH", `/api/imports/${view.id}`, { mapping });
            setBusy(false);
            if (result.ok) onSaved();
            else setMessage(result.error.message);
          }}
        >
          Run the dry run again
        </Button>
        <div className="space-y-1">
          <label htmlFor="mapping-name" className="block text-sm font-bold">
            Save this mapping as
          </label>
          <input
            id="mapping-name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            placeholder="e.g. club list 1962"
            className="min-h-11 rounded-md border-2 border-rule-strong bg-ground px-2"
          />
        </div>
        <Button
          type="button"
          variant="secondary"
          onClick={async () => {
            const result = await sendJson<{ name: string }>("POST", "/api/import-mappings", { name, mapping });
            setMessage(
              result.ok
                ? `Saved as “${result.data.name}”; choose it when you import the next file from the same source.`
                : result.error.message,
            );
          }}
        >
          Save
        </Button>
      </div>
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
  const { data } = useSWR(
    `/api/imports/${id}/rows`,
    async (url: string) =>
      (await fetch(url)).json() as Promise<{
        changes: Array<{ line: number; table: string; recordId: number; action: string }>;
        total: number;
      }>,
  );
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
  const { data, mutate } = useSWR(`/api/imports/${initial.id}`, fetchImport, {
    fallbackData: initial,
    refreshInterval: (latest) => (latest && BUSY.includes(latest.status) ? 700 : 0),
  });
  const view = data ?? initial;
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const busyOnServer = BUSY.includes(view.status);
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
              setBusy(true);
              setError(null);
              const result = await sendJson("POST", `/api/imports/${view.id}/commit`, {});
              setBusy(false);
              if (!result.ok) setError(result.error.message);
              await mutate();
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
              const result = await sendJson("DELETE", `/api/imports/${view.id}`);
              if (result.ok) router.push("/admin/imports?discarded=1");
              else setError(result.error.message);
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
                setBusy(true);
                const result = await sendJson("POST", `/api/imports/${view.id}/rollback`, {});
                setBusy(false);
                if (!result.ok) setError(result.error.message);
                await mutate();
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
            <table className="w-full text-left text-sm">
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
                    <td className="p-2 num">{r.line}</td>
                    <td className="p-2">{r.column ?? "—"}</td>
                    <td className="p-2">{r.reason}</td>
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
