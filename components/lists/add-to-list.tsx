"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import type { MeasuredKind } from "@/lib/lists/standard-item";

/** What goes on the list: a catalogue part (under its latest number), or a standard part a calculator worked out. */
export type ListItem =
  { partId: number } | { standard: { kind: MeasuredKind; designation: string; note?: string; template?: string } };

// The form, its checks and the member's lists load when a person asks to add, not with the page.
const AddToListForm = dynamic(() => import("@/components/lists/add-to-list-form").then((m) => m.AddToListForm), {
  loading: () => (
    <p className="text-sm" role="status">
      Opening your job lists…
    </p>
  ),
});

/** "Add to a job list": a button that opens the form in place. */
export function AddToList({ item, number, compact = false }: { item: ListItem; number: string; compact?: boolean }) {
  const [open, setOpen] = useState(false);
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
  return <AddToListForm item={item} number={number} onClose={() => setOpen(false)} />;
}
