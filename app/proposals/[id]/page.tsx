import type { Metadata } from "next";
import Link from "next/link";
import { ProposalDetails } from "@/components/proposals/proposal-details";
import { StatusBadge } from "@/components/proposals/status-badge";
import { WithdrawButton } from "@/components/proposals/withdraw-button";
import { Notice } from "@/components/ui/notice";
import { requirePagePermission } from "@/lib/auth/session";
import { getProposalDetail } from "@/lib/proposals/views";
import { loadByIdOr404 } from "@/lib/http/load-or-404";

export const metadata: Metadata = { title: "Your proposal" };

const date = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

const STATUS_WORDS: Record<string, string> = {
  pending: "Waiting for a moderator. You will get an e-mail when it is decided.",
  changes_requested: "Sent back to you with a question or a change to make. Change it and send it again.",
  approved: "Approved: the cross is in the catalogue.",
  rejected: "Not accepted. The moderator's message says why.",
};

/** A member's own proposal, in full, with what the moderator said (moderators may open any). */
export default async function ProposalPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("proposals:create", `/proposals/${idText}`);
  const d = await loadByIdOr404(idText, (id) => getProposalDetail(id, user));
  const open = d.status === "pending" || d.status === "changes_requested";
  return (
    <div className="space-y-6">
      <p>
        <Link href="/proposals">← Your proposals</Link>
      </p>
      <header className="space-y-2">
        <div className="flex flex-wrap items-center gap-3">
          <StatusBadge status={d.status} />
          <span className="text-ink-soft">
            Proposal #{d.id}, sent {date(d.createdAt)}
            {d.decidedAt && `, decided ${date(d.decidedAt)}`}
          </span>
        </div>
        <h1 className="num text-3xl">
          {d.part.number} <span aria-label="replaced by">→</span> {d.standardPart.designation}
        </h1>
        <p>{STATUS_WORDS[d.status]}</p>
      </header>

      {d.moderatorMessage ? (
        <section aria-labelledby="message-heading" className="rounded-lg border-l-4 border-brass bg-ground-raised p-4">
          <h2 id="message-heading" className="text-lg">
            The moderator&apos;s message
          </h2>
          <p className="whitespace-pre-line">{d.moderatorMessage}</p>
        </section>
      ) : (
        !open && <Notice>The moderator left no message.</Notice>
      )}

      <div className="flex flex-wrap gap-4">
        {d.status === "changes_requested" && d.mine && (
          <Link href={`/proposals/${d.id}/edit`} className="font-bold">
            Change and send again
          </Link>
        )}
        {open && d.mine && <WithdrawButton id={d.id} />}
        {d.status === "approved" && d.part.id && (
          <Link href={`/parts/${d.part.id}`}>See it on the part&apos;s page</Link>
        )}
      </div>

      <ProposalDetails detail={d} />
    </div>
  );
}
