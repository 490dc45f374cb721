"use client";

import { useRouter } from "next/navigation";
import { useApiAction } from "@/lib/hooks/use-api-action";

/** Withdraws an undecided proposal after the member confirms it, then shows the list of their proposals. */
export function WithdrawButton({ id }: { id: number }) {
  const router = useRouter();
  const { run, pending, error } = useApiAction();
  return (
    <span className="inline-flex flex-col">
      <button
        type="button"
        className="text-left underline disabled:opacity-60"
        disabled={pending}
        onClick={async () => {
          if (!window.confirm("Withdraw this proposal? Its text and photos are deleted.")) return;
          const result = await run("DELETE", `/api/proposals/${id}`);
          if (!result?.ok) return;
          router.push("/proposals");
          router.refresh();
        }}
      >
        Withdraw
      </button>
      {error && (
        <span className="text-sm font-bold text-caution" role="alert">
          {error.message}
        </span>
      )}
    </span>
  );
}
