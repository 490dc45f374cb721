"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { FitBadge } from "@/components/parts/fit-badge";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SortableTable } from "@/components/ui/sortable-table";
import { standardSizes } from "@/lib/catalogue/sizes";
import { sendJson } from "@/lib/http/post-json";
import { AddByNumber, addedText, type Added } from "@/components/lists/add-by-number";
import { useApiAction } from "@/lib/hooks/use-api-action";
import { useList } from "@/lib/hooks/use-lists";
import type { ListLine, ListView, NumberChoice, SerialChoice } from "@/lib/lists/lists";
import { Unbroken } from "@/components/ui/unbroken";
import { OfflineListNote } from "@/components/lists/offline-list-note";

const WIDE = "(min-width: 768px)";
const noSubscription = () => () => {};
const subscribeWide = (onChange: () => void) => {
  const query = window.matchMedia(WIDE);
  query.addEventListener("change", onChange);
  return () => query.removeEventListener("change", onChange);
};

/** A table on a wide screen, cards on a phone: one or the other is rendered, so each control exists once. */
function useWideScreen(): boolean {
  return useSyncExternalStore(
    subscribeWide,
    () => window.matchMedia(WIDE).matches,
    () => true,
  );
}

/** A text field of a line saved when it loses focus: notes, supplier, supplier's number, unit price. */
function TextCell({
  line,
  label,
  value: saved,
  save,
  placeholder,
  maxLength,
  width = "w-36",
  numeric = false,
}: {
  line: ListLine;
  label: string;
  value: string | null;
  save: (value: string) => Promise<string | null>;
  placeholder?: string;
  maxLength: number;
  width?: string;
  numeric?: boolean;
}) {
  const [value, setValue] = useState(saved ?? "");
  const [error, setError] = useState<string | null>(null);
  const id = `${label.replace(/\W+/g, "-").toLowerCase()}-${line.id}`;
  return (
    <div>
      <input
        aria-label={`${label} for ${line.number}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        value={value}
        maxLength={maxLength}
        inputMode={numeric ? "decimal" : undefined}
        placeholder={placeholder}
        onChange={(e) => setValue(e.target.value)}
        onBlur={async () => {
          if (value === (saved ?? "")) return;
          setError(await save(value));
        }}
        className={
          `${width} rounded-md border-2 bg-ground px-2 py-1 text-sm ` +
          `${numeric ? "num" : ""} ` +
          `${error ? "border-caution" : "border-rule-strong"}`
        }
      />
      {error && <FieldError id={`${id}-error`}>{error}</FieldError>}
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
        className={
          `w-20 rounded-md border-2 bg-ground px-2 py-1 num text-lg ` +
          `${error ? "border-caution" : "border-rule-strong"}`
        }
      />
      {error && <FieldError id={`quantity-${line.id}-error`}>{error}</FieldError>}
    </div>
  );
}

/** What the editor says after an action, with the buttons to go on where the server offered choices. */
type Message = {
  tone: "success" | "caution";
  text: string;
  numbers?: NumberChoice[];
  /** The quantity typed with the number, for the part chosen from `numbers`. */
  quantity?: number;
  serials?: { line: ListLine; choices: SerialChoice[] };
  undo?: { lineId: number; number: string };
};

/** How long the Undo button stays after a removal (the server keeps the line longer). */
const UNDO_SHOWN_MS = 10_000;

/** The job list as its owner works on it: add by number, edit lines inline, pick equivalents, share, export. */
/** A quantity or an "ordered" tick is kept to send later when there is no connection; other changes need one. */
function offlineEdit(line: ListLine, body: Record<string, unknown>) {
  if (typeof body.quantity === "number")
    return { kind: "quantity", lineId: line.id, number: line.number, from: line.quantity, to: body.quantity } as const;
  if (typeof body.ordered === "boolean")
    return { kind: "ordered", lineId: line.id, number: line.number, from: line.ordered, to: body.ordered } as const;
  return null;
}

const NEEDS_CONNECTION =
  "You are offline. This change needs a connection; quantities, “ordered” ticks and new lines are kept and sent later.";

export function ListEditor({ initial }: { initial: ListView }) {
  const { view, mutate, online, savedAt, waiting, outcome, queue } = useList(initial);
  const wide = useWideScreen();
  const action = useApiAction();
  const [message, setMessage] = useState<Message | null>(null);
  useEffect(() => {
    if (!message?.undo) return;
    const timer = setTimeout(() => setMessage((m) => (m?.undo ? null : m)), UNDO_SHOWN_MS);
    return () => clearTimeout(timer);
  }, [message]);

  /** Adds one of the parts a typed number may mean, at the quantity typed with it. */
  const addChosen = async (partId: number, quantity: number) => {
    const result = await action.run<Added>("POST", `/api/lists/${view.id}/lines`, { partId, quantity });
    if (!result) return;
    setMessage(
      result.ok ? { tone: "success", text: addedText(result.data) } : { tone: "caution", text: result.error.message },
    );
    await mutate();
  };
  const [shareUrl, setShareUrl] = useState<string | null>(
    initial.shareToken ? `/lists/shared/${initial.id}?token=${initial.shareToken}` : null,
  );
  const origin = useSyncExternalStore(
    noSubscription,
    () => window.location.origin,
    () => "",
  );

  // The same cells serve the table on wide screens and the cards on a phone.
  const { run, pending } = action;
  const cells = useMemo(() => {
    const patch = async (line: ListLine, body: Record<string, unknown>) => {
      const later = offlineEdit(line, body);
      if (!online && !later) return NEEDS_CONNECTION;
      if (!online && later) {
        await queue(later);
        return null;
      }
      const result = await sendJson("PATCH", `/api/lists/${view.id}/lines/${line.id}`, body);
      if (!result.ok && result.status === 0 && later) {
        await queue(later);
        return null;
      }
      await mutate();
      return result.ok ? null : result.error.message;
    };
    const addAssembly = async (line: ListLine, serial?: string) => {
      const result = await run<{
        added: number;
        machine: string;
        assembly: string;
        serial: string | null;
        serials: string | null;
        skipped: string[];
      }>("POST", `/api/lists/${view.id}/lines/${line.id}/assembly`, serial ? { serial } : {});
      if (!result) return;
      await mutate();
      if (!result.ok) {
        const choices =
          result.error.field === "serial" ? (result.error.choices as SerialChoice[] | undefined) : undefined;
        setMessage({ tone: "caution", text: result.error.message, serials: choices ? { line, choices } : undefined });
        return;
      }
      const { added, machine, assembly, serial: used, serials, skipped } = result.data;
      const forSerial = used ? `, serial ${used}` : serials ? `, ${serials}` : "";
      const already = skipped.length > 0 ? ` Already on the list: ${skipped.join(", ").toLowerCase()}.` : "";
      setMessage({
        tone: "success",
        text:
          added === 0
            ? `Every position of the ${assembly.toLowerCase()} (${machine}${forSerial}) is already on the list.`
            : `Added ${added} more ${added === 1 ? "part" : "parts"} of the ` +
              `${assembly.toLowerCase()} (${machine}${forSerial}), one for each ` +
              `position.${already}`,
      });
    };
    const remove = async (line: ListLine) => {
      const result = await run("DELETE", `/api/lists/${view.id}/lines/${line.id}`);
      if (!result) return;
      await mutate();
      setMessage(
        result.ok
          ? { tone: "success", text: `Removed ${line.number}.`, undo: { lineId: line.id, number: line.number } }
          : { tone: "caution", text: result.error.message },
      );
    };
    return {
      addAssembly,
      number: (l: ListLine) =>
        l.partId === null ? (
          <span className="text-sm text-ink-soft">none: sized from measurements</span>
        ) : (
          <>
            <Link href={`/parts/${l.partId}`} className="num font-bold whitespace-nowrap">
              {l.number}
            </Link>
            {l.earlierNumbers.length > 0 && (
              <span className="block num text-sm text-ink-soft">replaces {l.earlierNumbers.join(", ")}</span>
            )}
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
        if (!l.chosen) return <span className="text-ink-soft">{l.method ?? "no approved standard part"}</span>;
        return (
          <div className="space-y-1">
            {l.equivalents.length > 1 ? (
              <select
                aria-label={`Standard part for ${l.number}`}
                value={l.chosen.standardPartId}
                onChange={(e) => void patch(l, { standardPartId: Number(e.target.value) })}
                className="max-w-56 rounded-md border-2 border-rule-strong bg-ground px-2 py-1 num"
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
            <span className="block num text-sm text-ink-soft">{standardSizes(l.chosen)}</span>
            {l.measured?.template && (
              <span className="block text-sm">
                Template: <Link href={`/measure/gasket/print?${l.measured.template}&paper=a4`}>print on A4</Link> ·{" "}
                <Link href={`/measure/gasket/print?${l.measured.template}&paper=letter`}>Letter</Link> ·{" "}
                <Link href={`/measure/gasket?${l.measured.template}`}>change</Link>
              </span>
            )}
            {l.measured ? (
              <span className="block text-sm">Sized from your measurements</span>
            ) : (
              <FitBadge fit={l.chosen.fit} />
            )}
            {l.chosen.viaNumber && (
              <span className="block text-sm text-ink-soft">
                <Unbroken text={`recorded on ${l.chosen.viaNumber}`} />
              </span>
            )}
          </div>
        );
      },
      quantity: (l: ListLine) => <QuantityCell key={l.quantity} line={l} save={(q) => patch(l, { quantity: q })} />,
      notes: (l: ListLine) => (
        <TextCell
          key={l.notes ?? ""}
          line={l}
          label="Notes"
          value={l.notes}
          maxLength={500}
          placeholder="e.g. customer supplies"
          save={(v) => patch(l, { notes: v })}
        />
      ),
      supplier: (l: ListLine) => (
        <div className="space-y-1">
          <TextCell
            key={`s${l.supplier ?? ""}`}
            line={l}
            label="Supplier"
            value={l.supplier}
            maxLength={120}
            placeholder="Supplier"
            save={(v) => patch(l, { supplier: v })}
          />
          <TextCell
            key={`n${l.supplierNumber ?? ""}`}
            line={l}
            label="Supplier's number"
            value={l.supplierNumber}
            maxLength={60}
            placeholder="Their number"
            save={(v) => patch(l, { supplierNumber: v })}
          />
          <TextCell
            key={`p${l.unitPrice ?? ""}`}
            line={l}
            label="Unit price"
            value={l.unitPrice}
            maxLength={14}
            width="w-28"
            numeric
            placeholder="Price each"
            save={(v) => patch(l, { unitPrice: v })}
          />
        </div>
      ),
      ordered: (l: ListLine) => (
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={l.ordered}
            onChange={(e) => void patch(l, { ordered: e.target.checked })}
            className="h-5 w-5"
            aria-label={`${l.number} ordered`}
          />
          <span aria-hidden="true">Ordered</span>
        </label>
      ),
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
          <button
            type="button"
            className="text-left underline disabled:opacity-60"
            disabled={pending}
            onClick={() => void remove(l)}
          >
            Remove
          </button>
        </div>
      ),
    };
  }, [view.id, mutate, run, pending, online, queue]);

  const columns = useMemo<Array<ColumnDef<ListLine>>>(
    () => [
      { accessorKey: "number", header: "Factory number", cell: ({ row }) => cells.number(row.original) },
      {
        accessorKey: "description",
        header: "Part",
        cell: ({ row }) => (
          <div className="space-y-2">
            {cells.part(row.original)}
            {cells.actions(row.original)}
          </div>
        ),
      },
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
      {
        accessorKey: "quantity",
        header: "Qty",
        cell: ({ row }) => (
          <div className="space-y-1">
            {cells.quantity(row.original)}
            {cells.ordered(row.original)}
          </div>
        ),
      },
      {
        id: "supplier",
        accessorFn: (l) => l.supplier ?? "",
        header: "Supplier",
        cell: ({ row }) => cells.supplier(row.original),
      },
      { accessorKey: "notes", header: "Notes", enableSorting: false, cell: ({ row }) => cells.notes(row.original) },
    ],
    [cells],
  );

  return (
    <div className="space-y-6">
      <AddByNumber
        listId={view.id}
        onAdded={(text) => {
          setMessage({ tone: "success", text });
          void mutate();
        }}
        onChoices={(text, numbers, quantity) => setMessage({ tone: "caution", text, numbers, quantity })}
        onOffline={async (number, quantity) => {
          await queue({ kind: "add", number, quantity });
          setMessage({ tone: "success", text: `Kept ${quantity} × ${number} to add when the connection returns.` });
        }}
      />
      <OfflineListNote online={online} savedAt={savedAt} waiting={waiting} outcome={outcome} />
      {message && (
        <Notice tone={message.tone} role={message.tone === "caution" ? "alert" : "status"}>
          <span className="block">{message.text}</span>
          {message.numbers && message.numbers.length > 0 && (
            <span className="mt-2 flex flex-wrap gap-2">
              {message.numbers.map((c) => (
                <Button
                  key={c.partId}
                  type="button"
                  variant="secondary"
                  disabled={action.pending}
                  onClick={() => void addChosen(c.partId, message.quantity ?? 1)}
                >
                  <span className="num">{c.number}</span>
                  <span className="ml-2 text-sm font-normal">
                    {c.maker}, {c.description.toLowerCase()}
                  </span>
                </Button>
              ))}
            </span>
          )}
          {message.serials && (
            <span className="mt-2 flex flex-wrap gap-2">
              {message.serials.choices.map((c) => (
                <Button
                  key={c.serial}
                  type="button"
                  variant="secondary"
                  onClick={() => void cells.addAssembly(message.serials!.line, c.serial)}
                >
                  Serial {c.label}
                </Button>
              ))}
            </span>
          )}
          {message.undo && (
            <Button
              type="button"
              variant="secondary"
              className="mt-2"
              onClick={async () => {
                const undo = message.undo!;
                const result = await action.run("POST", `/api/lists/${view.id}/lines/${undo.lineId}/restore`, {});
                if (!result) return;
                await mutate();
                setMessage(
                  result.ok
                    ? { tone: "success", text: `${undo.number} is back on the list.` }
                    : { tone: "caution", text: result.error.message },
                );
              }}
            >
              Undo
            </Button>
          )}
        </Notice>
      )}

      {view.lines.length === 0 ? (
        <Notice>The list is empty. Add parts by number above, or from a part page or the look-up results.</Notice>
      ) : wide ? (
        <SortableTable
          rows={view.lines}
          columns={columns}
          count={(shown) =>
            `${shown} ${shown === 1 ? "line" : "lines"}, ${view.lines.reduce((s, l) => s + l.quantity, 0)} parts in all`
          }
          rowTestId="list-line"
        />
      ) : (
        <>
          <p className="text-sm text-ink-soft" role="status">
            {view.lines.length} {view.lines.length === 1 ? "line" : "lines"},{" "}
            {view.lines.reduce((s, l) => s + l.quantity, 0)} parts in all
          </p>
          <ul className="space-y-3" aria-label="Lines">
            {view.lines.map((l) => (
              <li
                key={l.id}
                className="space-y-2 rounded-lg border border-rule bg-ground-raised p-3"
                data-testid="list-line"
              >
                <div className="flex items-start justify-between gap-3">
                  <div>
                    {cells.number(l)}
                    {cells.part(l)}
                  </div>
                  {cells.quantity(l)}
                </div>
                {cells.standard(l)}
                {l.warnings.length > 0 && cells.warnings(l)}
                {cells.supplier(l)}
                {cells.ordered(l)}
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
                {t.name}: <span className="num font-bold">{t.quantity}</span> ({t.lines}{" "}
                {t.lines === 1 ? "line" : "lines"})
              </li>
            ))}
          </ul>
          {view.warnings > 0 && (
            <Notice tone="caution">
              {view.warnings} {view.warnings === 1 ? "line needs" : "lines need"} a check before ordering: each is
              marked ⚠ under “Order as”, with the number it is about.
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
          <p className="text-sm text-ink-soft">
            One row a line: the list, machine and serial, factory number, standard designation, sizes, fit, quantity,
            supplier details and your notes.
          </p>
        </div>
        <div className="space-y-2 rounded-lg border border-rule bg-ground-raised p-4">
          <h2 className="text-xl">Share</h2>
          {shareUrl ? (
            <>
              <p className="text-sm">Anyone with this link can read the list (not change it):</p>
              <input
                readOnly
                aria-label="Share link"
                value={`${origin}${shareUrl}`}
                className="w-full rounded-md border border-rule-strong bg-ground px-2 py-1 num text-sm"
                onFocus={(e) => e.target.select()}
              />
              <button
                type="button"
                className="text-sm underline"
                onClick={async () => {
                  await action.run("POST", `/api/lists/${view.id}/share`, { enabled: false });
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
                const result = await action.run<{ token: string }>("POST", `/api/lists/${view.id}/share`, {
                  enabled: true,
                });
                if (result?.ok) setShareUrl(`/lists/shared/${view.id}?token=${result.data.token}`);
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
