"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import useSWR from "swr";
import { FitBadge } from "@/components/parts/fit-badge";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SortableTable } from "@/components/ui/sortable-table";
import { standardSizes } from "@/lib/catalogue/sizes";
import { sendJson } from "@/lib/http/post-json";
import type { ListLine, ListView } from "@/lib/lists/lists";

const WIDE = "(min-width: 768px)";
const subscribeWide = (onChange: () => void) => {
  const query = window.matchMedia(WIDE);
  query.addEventListener("change", onChange);
  return () => query.removeEventListener("change", onChange);
};

/** A table on a wide screen, cards on a phone: one or the other is rendered, so each control exists once. */
function useWideScreen(): boolean {
  return useSyncExternalStore(subscribeWide, () => window.matchMedia(WIDE).matches, () => true);
}

async function fetchList(url: string): Promise<ListView> {
  const response = await fetch(url);
  if (!response.ok) throw new Error("The list could not be loaded.");
  return response.json();
}

function NotesCell({ line, save }: { line: ListLine; save: (notes: string) => Promise<string | null> }) {
  const [value, setValue] = useState(line.notes ?? "");
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <input
        aria-label={`Notes for ${line.number}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `notes-${line.id}-error` : undefined}
        value={value}
        maxLength={500}
        placeholder="e.g. customer supplies"
        onChange={(e) => setValue(e.target.value)}
        onBlur={async () => {
          if (value === (line.notes ?? "")) return;
          setError(await save(value));
        }}
        className={`w-36 rounded-md border-2 bg-ground px-2 py-1 text-sm ${error ? "border-caution" : "border-rule-strong"}`}
      />
      {error && <FieldError id={`notes-${line.id}-error`}>{error}</FieldError>}
    </div>
  );
}

function QuantityCell({ line, save }: { line: ListLine; save: (quantity: number) => Promise<string | null> }) {
  const [value, setValue] = useState(String(line.quantity));
  const [error, setError] = useState<string | null>(null);
  const commit = async () => {
    const n = Number(value);
    if (n === line.quantity) return;
    if (!Number.isInteger(n) || n < 1 || n > 9999) {
      setError("A whole number from 1 to 9999.");
      return;
    }
    setError(await save(n));
  };
  return (
    <div>
      <input
        aria-label={`Quantity of ${line.number}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `quantity-${line.id}-error` : undefined}
        inputMode="numeric"
        value={value}
        onChange={(e) => setValue(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") {
            e.preventDefault();
            void commit();
          }
        }}
        className={`num w-20 rounded-md border-2 bg-ground px-2 py-1 text-lg ${error ? "border-caution" : "border-rule-strong"}`}
      />
      {error && <FieldError id={`quantity-${line.id}-error`}>{error}</FieldError>}
    </div>
  );
}

/** The job list as its owner works on it: add by number, edit quantities inline, pick equivalents, share, export. */
export function ListEditor({ initial }: { initial: ListView }) {
  const { data, mutate } = useSWR(`/api/lists/${initial.id}`, fetchList, { fallbackData: initial, revalidateOnFocus: false });
  const view = data ?? initial;
  const wide = useWideScreen();
  const [number, setNumber] = useState("");
  const [quantity, setQuantity] = useState("1");
  const [message, setMessage] = useState<{ tone: "success" | "caution"; text: string } | null>(null);
  const [adding, setAdding] = useState(false);
  const [shareUrl, setShareUrl] = useState<string | null>(initial.shareToken ? `/lists/shared/${initial.id}?token=${initial.shareToken}` : null);
  const [origin, setOrigin] = useState("");
  useEffect(() => setOrigin(window.location.origin), []);

  // The same cells serve the table on wide screens and the cards on a phone.
  const cells = useMemo(() => {
    const patch = async (line: ListLine, body: Record<string, unknown>) => {
      const result = await sendJson("PATCH", `/api/lists/${view.id}/lines/${line.id}`, body);
      await mutate();
      return result.ok ? null : result.error.message;
    };
    const addAssembly = async (line: ListLine) => {
      const result = await sendJson<{ added: number; machine: string; assembly: string }>("POST", `/api/lists/${view.id}/lines/${line.id}/assembly`, {});
      await mutate();
      setMessage(
        result.ok
          ? { tone: "success", text: result.data.added === 0 ? `Everything from the ${result.data.assembly} (${result.data.machine}) is already on the list.` : `Added ${result.data.added} more ${result.data.added === 1 ? "part" : "parts"} of the ${result.data.assembly} (${result.data.machine}).` }
          : { tone: "caution", text: result.error.message },
      );
    };
    const remove = async (line: ListLine) => {
      await sendJson("DELETE", `/api/lists/${view.id}/lines/${line.id}`);
      await mutate();
    };
    return {
      number: (l: ListLine) =>
        l.partId === null ? (
          <span className="text-sm text-ink-soft">none: sized from measurements</span>
        ) : (
          <>
            <Link href={`/parts/${l.partId}`} className="num whitespace-nowrap font-bold">
              {l.number}
            </Link>
            {l.requestedNumber && <span className="block text-sm text-ink-soft">asked for as {l.requestedNumber}</span>}
          </>
        ),
      part: (l: ListLine) => (
        <div className="min-w-40">
          {l.description}
          <span className="block text-sm text-ink-soft">
            {l.maker} · {l.categoryName}
          </span>
        </div>
      ),
      standard: (l: ListLine) => {
        if (!l.chosen) return <span className="text-ink-soft">no approved cross</span>;
        return (
          <div className="space-y-1">
            {l.equivalents.length > 1 ? (
              <select
                aria-label={`Standard part for ${l.number}`}
                value={l.chosen.standardPartId}
                onChange={(e) => void patch(l, { standardPartId: Number(e.target.value) })}
                className="num max-w-56 rounded-md border-2 border-rule-strong bg-ground px-2 py-1"
              >
                {l.equivalents.map((e) => (
                  <option key={e.standardPartId} value={e.standardPartId}>
                    {e.designation}
                  </option>
                ))}
              </select>
            ) : (
              <span className="num font-bold">{l.chosen.designation}</span>
            )}
            <span className="num block text-sm text-ink-soft">{standardSizes(l.chosen)}</span>
            {l.measured ? <span className="block text-sm">Sized from your measurements</span> : <FitBadge fit={l.chosen.fit} />}
          </div>
        );
      },
      quantity: (l: ListLine) => <QuantityCell key={l.quantity} line={l} save={(q) => patch(l, { quantity: q })} />,
      notes: (l: ListLine) => <NotesCell key={l.notes ?? ""} line={l} save={(n) => patch(l, { notes: n })} />,
      warnings: (l: ListLine) =>
        l.warnings.length === 0 ? (
          <span className="text-sm text-ink-soft">—</span>
        ) : (
          <ul className="space-y-1 text-sm">
            {l.warnings.map((w) => (
              <li key={w} className="font-bold text-caution">
                ⚠ {w}
              </li>
            ))}
          </ul>
        ),
      actions: (l: ListLine) => (
        <div className="flex min-w-32 flex-col items-start gap-2 text-sm">
          {l.hasAssembly && (
            <button type="button" className="text-left underline" onClick={() => void addAssembly(l)}>
              Add the rest of the assembly
            </button>
          )}
          <button type="button" className="text-left underline" onClick={() => void remove(l)}>
            Remove
          </button>
        </div>
      ),
    };
  }, [view.id, mutate]);

  const columns = useMemo<Array<ColumnDef<ListLine>>>(
    () => [
      { accessorKey: "number", header: "Factory number", cell: ({ row }) => cells.number(row.original) },
      { accessorKey: "description", header: "Part", cell: ({ row }) => cells.part(row.original) },
      {
        id: "standard",
        accessorFn: (l) => l.chosen?.designation ?? "",
        header: "Order as",
        cell: ({ row }) => (
          <div className="space-y-2">
            {cells.standard(row.original)}
            {row.original.warnings.length > 0 && cells.warnings(row.original)}
          </div>
        ),
      },
      { accessorKey: "quantity", header: "Qty", cell: ({ row }) => cells.quantity(row.original) },
      { accessorKey: "notes", header: "Notes", enableSorting: false, cell: ({ row }) => cells.notes(row.original) },
      { id: "actions", header: "", enableSorting: false, cell: ({ row }) => cells.actions(row.original) },
    ],
    [cells],
  );

  return (
    <div className="space-y-6">
      <form
        className="flex flex-wrap items-end gap-3 rounded-lg border border-rule bg-ground-raised p-4"
        onSubmit={async (e) => {
          e.preventDefault();
          setAdding(true);
          setMessage(null);
          const result = await sendJson<{ superseded: boolean; merged: boolean }>("POST", `/api/lists/${view.id}/lines`, { number, quantity: Number(quantity) || 1 });
          setAdding(false);
          if (result.ok) {
            setNumber("");
            setQuantity("1");
            setMessage({ tone: "success", text: result.data.merged ? "Already on the list: its quantity was raised." : result.data.superseded ? "Added under its latest number (the one you typed is superseded)." : "Added." });
            await mutate();
          } else setMessage({ tone: "caution", text: result.error.message });
        }}
      >
        <div className="min-w-56 flex-1 space-y-1">
          <label htmlFor="add-number" className="block font-bold">
            Add a part by factory number
          </label>
          <input id="add-number" value={number} onChange={(e) => setNumber(e.target.value)} required className="num block min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground px-3 text-lg" />
        </div>
        <div className="w-24 space-y-1">
          <label htmlFor="add-quantity" className="block font-bold">
            Qty
          </label>
          <input id="add-quantity" inputMode="numeric" value={quantity} onChange={(e) => setQuantity(e.target.value)} className="num block min-h-12 w-full rounded-md border-2 border-rule-strong bg-ground px-3 text-lg" />
        </div>
        <Button type="submit" pending={adding}>
          Add
        </Button>
      </form>
      {message && (
        <Notice tone={message.tone} role={message.tone === "caution" ? "alert" : "status"}>
          {message.text}
        </Notice>
      )}

      {view.lines.length === 0 ? (
        <Notice>The list is empty. Add parts by number above, or from a part page or the look-up results.</Notice>
      ) : wide ? (
        <SortableTable rows={view.lines} columns={columns} count={(shown) => `${shown} ${shown === 1 ? "line" : "lines"}, ${view.lines.reduce((s, l) => s + l.quantity, 0)} parts in all`} rowTestId="list-line" />
      ) : (
        <>
          <p className="text-sm text-ink-soft" role="status">
            {view.lines.length} {view.lines.length === 1 ? "line" : "lines"}, {view.lines.reduce((s, l) => s + l.quantity, 0)} parts in all
          </p>
          <ul className="space-y-3" aria-label="Lines">
            {view.lines.map((l) => (
              <li key={l.id} className="space-y-2 rounded-lg border border-rule bg-ground-raised p-3" data-testid="list-line">
                <div className="flex items-start justify-between gap-3">
                  <div>
                    {cells.number(l)}
                    {cells.part(l)}
                  </div>
                  {cells.quantity(l)}
                </div>
                {cells.standard(l)}
                {l.warnings.length > 0 && cells.warnings(l)}
                {cells.notes(l)}
                {cells.actions(l)}
              </li>
            ))}
          </ul>
        </>
      )}

      {view.totals.length > 0 && (
        <section aria-labelledby="totals-heading" className="space-y-2">
          <h2 id="totals-heading" className="text-xl">
            Totals by kind
          </h2>
          <ul className="flex flex-wrap gap-3">
            {view.totals.map((t) => (
              <li key={t.category} className="rounded-md border border-rule bg-ground-raised px-3 py-2">
                {t.name}: <span className="num font-bold">{t.quantity}</span> ({t.lines} {t.lines === 1 ? "line" : "lines"})
              </li>
            ))}
          </ul>
          {view.warnings > 0 && (
            <Notice tone="caution">
              {view.warnings} {view.warnings === 1 ? "line needs" : "lines need"} a check before ordering: see the Check column.
            </Notice>
          )}
        </section>
      )}

      <section aria-labelledby="out-heading" className="grid gap-4 md:grid-cols-2">
        <div className="space-y-2 rounded-lg border border-rule bg-ground-raised p-4">
          <h2 id="out-heading" className="text-xl">
            Order and print
          </h2>
          <p className="flex flex-wrap gap-4">
            <a href={`/api/lists/${view.id}/export.csv`} download className="font-bold">
              Download CSV
            </a>
            <Link href={`/lists/${view.id}/print`} className="font-bold">
              Printable sheet
            </Link>
          </p>
          <p className="text-sm text-ink-soft">One line a part: factory number, standard designation, sizes, quantity and notes.</p>
        </div>
        <div className="space-y-2 rounded-lg border border-rule bg-ground-raised p-4">
          <h2 className="text-xl">Share</h2>
          {shareUrl ? (
            <>
              <p className="text-sm">Anyone with this link can read the list (not change it):</p>
              <input readOnly aria-label="Share link" value={`${origin}${shareUrl}`} className="num w-full rounded-md border border-rule-strong bg-ground px-2 py-1 text-sm" onFocus={(e) => e.target.select()} />
              <button
                type="button"
                className="text-sm underline"
                onClick={async () => {
                  await sendJson("POST", `/api/lists/${view.id}/share`, { enabled: false });
                  setShareUrl(null);
                }}
              >
                Stop sharing
              </button>
            </>
          ) : (
            <Button
              type="button"
              variant="secondary"
              onClick={async () => {
                const result = await sendJson<{ token: string }>("POST", `/api/lists/${view.id}/share`, { enabled: true });
                if (result.ok) setShareUrl(`/lists/shared/${view.id}?token=${result.data.token}`);
              }}
            >
              Make a read-only link
            </Button>
          )}
        </div>
      </section>
    </div>
  );
}
