"use client";

import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { useApiForm } from "@/lib/hooks/use-api-form";
import type { Decision } from "@/lib/proposals/kinds";
import { decisionInput } from "@/lib/validation/proposals";

const LABELS: Record<Decision, string> = {
  approve: "Approve",
  request_changes: "Send back for changes",
  reject: "Reject",
};

/**
 * Approve, send back or reject; the version read with the page goes along, so a decision made meanwhile wins. What a
 * decision needs (a message to reject or send back) is the shared schema's rule, said in its words.
 */
export function DecisionPanel({ id, version }: { id: number; version: number }) {
  const router = useRouter();
  const { form, onSubmit, formError, pending } = useApiForm({
    schema: decisionInput,
    endpoint: `/api/proposals/${id}/decision`,
    defaultValues: { action: "approve" as Decision, message: "", version },
    onSuccess: (data: { proposal: { status: string } }) => {
      router.push(`/review?done=${data.proposal.status}`);
      router.refresh();
    },
  });
  const chosen = form.watch("action");
  const error = form.formState.errors.message?.message;
  return (
    <form
      aria-labelledby="decide-heading"
      className="space-y-3 rounded-lg border-2 border-brass bg-ground-raised p-4"
      onSubmit={onSubmit}
      noValidate
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
          aria-describedby={error ? "decision-message-hint decision-message-error" : "decision-message-hint"}
          aria-invalid={error ? true : undefined}
          className="block w-full rounded-md border-2 border-rule-strong bg-ground px-3 py-2 text-lg focus:border-brass"
          {...form.register("message")}
        />
        {error && <FieldError id="decision-message-error">{error}</FieldError>}
      </div>
      {formError && (
        <Notice tone="caution" role="alert">
          {formError}
        </Notice>
      )}
      <div className="flex flex-wrap gap-3">
        {(["approve", "request_changes", "reject"] as const).map((action) => (
          <Button
            key={action}
            type="submit"
            variant={action === "approve" ? "primary" : "secondary"}
            pending={pending && chosen === action}
            disabled={pending}
            onClick={() => form.setValue("action", action)}
          >
            {LABELS[action]}
          </Button>
        ))}
      </div>
    </form>
  );
}
