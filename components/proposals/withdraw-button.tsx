"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/http/post-json";

/** Withdraws an undecided proposal after the member confirms it. */
export function WithdrawButton({ id }: { id: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <span className="inline-flex flex-col">
      <button
        type="button"
        className="text-left underline disabled:opacity-60"
        disabled={busy}
        onClick={async () => {
          if (!window.confirm("Withdraw this proposal? Its text and photos are deleted.")) return;
          setBusy(true);
          const result = await sendJson("DELETE", `/api/proposals/${id}`);
          setBusy(false);
          if (result.ok) router.refresh();
          else setError(result.error.message);
        }}
      >
        Withdraw
      </button>
      {error && <span className="text-sm font-bold text-caution">{error}</span>}
    </span>
  );
}
