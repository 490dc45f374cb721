"use client";

import { useState } from "react";
import { sendJson } from "@/lib/http/post-json";

/** Whether Understudy e-mails the member about their proposals (and reviewers their summary); saved at once. */
export function NotificationsToggle({ initial, reviewer }: { initial: boolean; reviewer: boolean }) {
  const [on, setOn] = useState(initial);
  const [state, setState] = useState<"idle" | "saving" | "saved" | "failed">("idle");
  return (
    <div className="space-y-1">
      <label className="flex cursor-pointer items-start gap-3">
        <input
          type="checkbox"
          checked={on}
          disabled={state === "saving"}
          className="mt-1 h-5 w-5 accent-brass"
          onChange={async (e) => {
            const next = e.target.checked;
            setOn(next);
            setState("saving");
            const result = await sendJson("PATCH", "/api/account", { notifyByEmail: next });
            if (result.ok) setState("saved");
            else {
              setOn(!next);
              setState("failed");
            }
          }}
        />
        <span>
          <span className="font-bold">E-mail me about my proposals</span>
          <span className="block text-sm text-ink-soft">
            When a moderator approves, rejects or sends back a cross you proposed
            {reviewer ? ", and a summary of new proposals to review" : ""}. Messages about your account itself
            (password, address) are always sent.
          </span>
        </span>
      </label>
      <p className="text-sm text-ink-soft" role="status">
        {state === "saving"
          ? "Saving…"
          : state === "saved"
            ? "Saved."
            : state === "failed"
              ? "Not saved: try again."
              : ""}
      </p>
    </div>
  );
}
