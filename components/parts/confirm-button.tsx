"use client";

import dynamic from "next/dynamic";
import Link from "next/link";
import { useState } from "react";

const ConfirmForm = dynamic(() => import("@/components/parts/confirm-form").then((m) => m.ConfirmForm), {
  loading: () => (
    <p className="text-sm" role="status">
      Opening…
    </p>
  ),
});

/** "I fitted this too": a member's confirmation, with an optional note, counted once per member. */
export function ConfirmButton({ crossId, signedIn }: { crossId: number; signedIn: boolean }) {
  const [open, setOpen] = useState(false);
  if (!signedIn) {
    return (
      <p className="text-sm">
        <Link href="/sign-in">Sign in</Link> to say you fitted this too.
      </p>
    );
  }
  if (!open) {
    return (
      <button type="button" className="text-sm font-bold underline" onClick={() => setOpen(true)}>
        I fitted this too
      </button>
    );
  }
  return <ConfirmForm crossId={crossId} onClose={() => setOpen(false)} />;
}
