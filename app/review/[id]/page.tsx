import type { Metadata } from "next";
import Link from "next/link";
import { FitBadge } from "@/components/parts/fit-badge";
import { ProposalDetails } from "@/components/proposals/proposal-details";
import { StatusBadge } from "@/components/proposals/status-badge";
import { DecisionPanel } from "@/components/review/decision-panel";
import { Notice } from "@/components/ui/notice";
import { requirePagePermission } from "@/lib/auth/session";
import { loadByIdOr404 } from "@/lib/http/load-or-404";
import { getProposalDetail } from "@/lib/proposals/views";

export const metadata: Metadata = { title: "Review a proposal" };

export default async function ReviewProposalPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: idText } = await params;
  const user = await requirePagePermission("proposals:review", `/review/${idText}`);
  const d = await loadByIdOr404(idText, (id) => getProposalDetail(id, user));
  const warnings = d.checks.filter((c) => c.level === "warning");

  return (
    <div className="space-y-6">
      <p>
        <Link href="/review">← Back to the queue</Link>
      </p>
      <header className="space-y-2">
        <div className="flex flex-wrap items-center gap-3">
          <StatusBadge status={d.status} />
          <span className="text-ink-soft">
            Proposal #{d.id} from {d.submitter}, sent {new Date(d.createdAt).toUTCString().slice(0, 16)}
          </span>
        </div>
        <h1 className="num text-3xl">
          {d.part.number} <span aria-label="replaced by">→</span> {d.standardPart.designation}
        </h1>
      </header>
      {d.sizeMismatch && (
        <div data-testid="size-mismatch">
          <Notice tone="caution" role="alert">
            <strong className="mr-1">Not the same size.</strong>
            {d.sizeMismatch.message}
          </Notice>
        </div>
      )}

      <div className="grid gap-6 lg:grid-cols-2">
        <ProposalDetails detail={d} />

        <div className="space-y-6">
          <section aria-labelledby="catalogue-heading" className="space-y-3">
            <h2 id="catalogue-heading" className="text-2xl">
              What the catalogue already says
            </h2>
            {d.part.isNew ? (
              <Notice>The part is not in the catalogue, so there is nothing to compare with.</Notice>
            ) : d.existingCrosses.length === 0 ? (
              <Notice>No cross for this part yet.</Notice>
            ) : (
              <ul className="space-y-2">
                {d.existingCrosses.map((c) => (
                  <li
                    key={c.id}
                    className="flex flex-wrap items-center gap-3 rounded-md border border-rule bg-ground-raised p-3"
                  >
                    <span className="num font-bold">{c.designation ?? c.repairMethod}</span>
                    <FitBadge fit={c.fit} />
                    <span className="text-sm text-ink-soft">
                      {c.status === "approved" ? `approved · ${c.confirmations} fitted` : c.status}
                    </span>
                  </li>
                ))}
              </ul>
            )}
            {warnings.length > 0 && (
              <Notice tone="caution">
                The engine found {warnings.length === 1 ? "a problem" : `${warnings.length} problems`} with the standard
                part: see the left.
              </Notice>
            )}
          </section>

          <section aria-labelledby="member-heading" className="space-y-2">
            <h2 id="member-heading" className="text-2xl">
              The member
            </h2>
            <p>
              <span className="font-bold break-all">{d.submitter}</span>: {d.submitterRecord.approved} approved,{" "}
              {d.submitterRecord.rejected} rejected, {d.submitterRecord.open} open.
            </p>
            {d.confirmations > 0 && (
              <p>
                {d.confirmations} other {d.confirmations === 1 ? "member says they" : "members say they"} fitted the
                same.
              </p>
            )}
          </section>

          {d.status !== "pending" ? (
            <Notice>This proposal is {d.status.replace("_", " ")}; there is nothing to decide.</Notice>
          ) : d.mine ? (
            <Notice tone="caution">This is your own proposal. Another moderator decides it.</Notice>
          ) : (
            <DecisionPanel id={d.id} version={d.version} />
          )}
        </div>
      </div>
    </div>
  );
}
