import { STATUS_NAMES, type ProposalStatus } from "@/lib/proposals/kinds";

const STYLE: Record<ProposalStatus, string> = {
  pending: "border-rule-strong bg-ground-raised",
  changes_requested: "border-caution bg-caution-wash",
  approved: "border-brass bg-brass-wash",
  rejected: "border-ink/60 bg-ground-sunk",
};

const MARK: Record<ProposalStatus, string> = { pending: "…", changes_requested: "↩", approved: "✓", rejected: "✕" };

/** The word carries the status; the mark and colour only repeat it. */
export function StatusBadge({ status }: { status: ProposalStatus }) {
  return (
    <span
      className={
        `inline-flex items-center gap-1 rounded border px-2 py-0.5 text-sm ` +
        `font-bold whitespace-nowrap ${STYLE[status]}`
      }
      data-status={status}
    >
      <span aria-hidden="true">{MARK[status]}</span>
      {STATUS_NAMES[status]}
    </span>
  );
}
