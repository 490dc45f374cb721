"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { postJson } from "@/lib/http/post-json";

/** "I fitted this too": a member's confirmation, with an optional note, counted once per member. */
export function ConfirmButton({ crossId, signedIn }: { crossId: number; signedIn: boolean }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState("");
  const [state, setState] = useState<{ tone: "done" | "problem"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  if (!signedIn) {
    return (
      <p className="text-sm">
        <Link href="/sign-in">Sign in</Link> to say you fitted this too.
      </p>
    );
  }
  if (state?.tone === "done")
    return (
      <p className="text-sm font-bold" role="status">
        ✓ {state.text}
      </p>
    );
  if (!open) {
    return (
      <button type="button" className="text-sm font-bold underline" onClick={() => setOpen(true)}>
        I fitted this too
      </button>
    );
  }
  return (
    <form
      className="space-y-2"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        const result = await postJson(`/api/crosses/${crossId}/confirmations`, { note });
        setBusy(false);
        if (result.ok) {
          setState({ tone: "done", text: "Thank you: your confirmation is counted." });
          router.refresh();
        } else setState({ tone: "problem", text: result.error.message });
      }}
    >
      <label htmlFor={`confirm-note-${crossId}`} className="block text-sm font-bold">
        A note for others (optional)
      </label>
      <input
        id={`confirm-note-${crossId}`}
        value={note}
        maxLength={500}
        onChange={(e) => setNote(e.target.value)}
        placeholder="e.g. fitted 2021, 300 hours since"
        className="min-h-11 w-full rounded-md border-2 border-rule-strong bg-ground px-3"
      />
      <div className="flex gap-3">
        <button
          type="submit"
          disabled={busy}
          className="rounded-md bg-brass px-4 py-2 text-sm font-bold text-white disabled:opacity-60"
        >
          Confirm
        </button>
        <button type="button" className="text-sm underline" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
      {state?.tone === "problem" && (
        <p className="text-sm font-bold text-caution" role="alert">
          {state.text}
        </p>
      )}
    </form>
  );
}
