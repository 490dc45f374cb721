"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { Decision } from "@/lib/proposals/kinds";
import { postJson } from "@/lib/http/post-json";

const LABELS: Record<Decision, string> = {
  approve: "Approve",
  request_changes: "Send back for changes",
  reject: "Reject",
};

/** Approve, send back or reject; the version read with the page goes along, so a decision made meanwhile wins. */
export function DecisionPanel({ id, version }: { id: number; version: number }) {
  const router = useRouter();
  const [message, setMessage] = useState("");
  const [pending, setPending] = useState<Decision | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function decide(action: Decision) {
    setError(null);
    if (action !== "approve" && message.trim().length < 3) {
      setError(action === "reject" ? "Give the member a reason for the rejection." : "Tell the member what to change.");
      return;
    }
    setPending(action);
    const result = await postJson<{ proposal: { status: string } }>(`/api/proposals/${id}/decision`, {
      action,
      message,
      version,
    });
    setPending(null);
    if (result.ok) {
      router.push(`/review?done=${result.data.proposal.status}`);
      router.refresh();
    } else {
      setError(result.error.message);
    }
  }

  return (
    <section
      aria-labelledby="decide-heading"
      className="space-y-3 rounded-lg border-2 border-brass bg-ground-raised p-4"
    >
      <h2 id="decide-heading" className="text-xl">
        Your decision
      </h2>
      <div className="space-y-1">
        <label htmlFor="decision-message" className="block font-bold">
          Message to the member
        </label>
        <p id="decision-message-hint" className="text-sm text-ink-soft">
          Needed to reject or send back; optional when approving. Sent by e-mail as plain text.
        </p>
        <textarea
          id="decision-message"
          rows={4}
          value={message}
          aria-describedby="decision-message-hint"
          onChange={(e) => setMessage(e.target.value)}
          className="block w-full rounded-md border-2 border-rule-strong bg-ground px-3 py-2 text-lg focus:border-brass"
        />
      </div>
      {error && (
        <Notice tone="caution" role="alert">
          {error}
        </Notice>
      )}
      <div className="flex flex-wrap gap-3">
        {(["approve", "request_changes", "reject"] as const).map((action) => (
          <Button
            key={action}
            type="button"
            variant={action === "approve" ? "primary" : "secondary"}
            pending={pending === action}
            disabled={pending !== null}
            onClick={() => decide(action)}
          >
            {LABELS[action]}
          </Button>
        ))}
      </div>
    </section>
  );
}
