"use client";

import Link from "next/link";
import { useId, useState } from "react";
import useSWR from "swr";
import { postJson } from "@/lib/http/post-json";
import type { MeasuredKind } from "@/lib/lists/standard-item";

interface ListSummary {
  id: number;
  title: string;
}

const fetchLists = async (url: string): Promise<ListSummary[]> => {
  const response = await fetch(url);
  if (!response.ok) return [];
  return ((await response.json()) as { lists: ListSummary[] }).lists;
};

/** What goes on the list: a catalogue part (under its latest number), or a standard part a calculator worked out. */
export type ListItem = { partId: number } | { standard: { kind: MeasuredKind; designation: string; note?: string } };

/** Puts this part on one of the member's job lists (or a new one). */
export function AddToList({ item, number, compact = false }: { item: ListItem; number: string; compact?: boolean }) {
  const [open, setOpen] = useState(false);
  const { data: lists, mutate } = useSWR(open ? "/api/lists" : null, fetchLists);
  const [choice, setChoice] = useState("");
  const [title, setTitle] = useState("");
  const [quantity, setQuantity] = useState("1");
  const [done, setDone] = useState<{ id: number; text: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const id = useId();

  if (!open) {
    return (
      <button
        type="button"
        onClick={() => setOpen(true)}
        className={compact ? "text-sm underline" : "font-bold underline"}
      >
        Add to a job list
      </button>
    );
  }
  if (done) {
    return (
      <p className="text-sm" role="status">
        ✓ {done.text} <Link href={`/lists/${done.id}`}>Open the list</Link>
      </p>
    );
  }
  const selected = choice || (lists && lists[0] ? String(lists[0].id) : "new");
  return (
    <form
      className="flex flex-wrap items-end gap-2 rounded-md border border-rule bg-ground p-2"
      onSubmit={async (e) => {
        e.preventDefault();
        setError(null);
        let listId = Number(selected);
        if (selected === "new") {
          const created = await postJson<{ id: number }>("/api/lists", { title });
          if (!created.ok) return setError(created.error.message);
          listId = created.data.id;
          await mutate();
        }
        const added = await postJson<{ superseded: boolean; merged: boolean }>(`/api/lists/${listId}/lines`, {
          ...item,
          quantity: Number(quantity) || 1,
        });
        if (!added.ok) return setError(added.error.message);
        setDone({
          id: listId,
          text: added.data.merged
            ? `${number} was already on the list; quantity raised.`
            : added.data.superseded
              ? `Added under ${number}'s latest number.`
              : `${number} added.`,
        });
      }}
    >
      <div>
        <label htmlFor={`${id}-list`} className="block text-sm font-bold">
          List
        </label>
        <select
          id={`${id}-list`}
          value={selected}
          onChange={(e) => setChoice(e.target.value)}
          className="min-h-10 max-w-56 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
        >
          {(lists ?? []).map((l) => (
            <option key={l.id} value={l.id}>
              {l.title}
            </option>
          ))}
          <option value="new">A new list…</option>
        </select>
      </div>
      {selected === "new" && (
        <div>
          <label htmlFor={`${id}-title`} className="block text-sm font-bold">
            New list&apos;s title
          </label>
          <input
            id={`${id}-title`}
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            required
            minLength={2}
            className="min-h-10 rounded-md border-2 border-rule-strong bg-ground-raised px-2"
          />
        </div>
      )}
      <div>
        <label htmlFor={`${id}-qty`} className="block text-sm font-bold">
          Qty
        </label>
        <input
          id={`${id}-qty`}
          inputMode="numeric"
          value={quantity}
          onChange={(e) => setQuantity(e.target.value)}
          className="min-h-10 w-16 rounded-md border-2 border-rule-strong bg-ground-raised px-2 num"
        />
      </div>
      <button type="submit" className="min-h-10 rounded-md bg-brass px-3 font-bold text-white">
        Add
      </button>
      <button type="button" className="min-h-10 text-sm underline" onClick={() => setOpen(false)}>
        Cancel
      </button>
      {error && (
        <p className="w-full text-sm font-bold text-caution" role="alert">
          {error}
        </p>
      )}
    </form>
  );
}
