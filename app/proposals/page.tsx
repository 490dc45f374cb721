import type { Metadata } from "next";
import Link from "next/link";
import { FitBadge } from "@/components/parts/fit-badge";
import { StatusBadge } from "@/components/proposals/status-badge";
import { WithdrawButton } from "@/components/proposals/withdraw-button";
import { Notice } from "@/components/ui/notice";
import { requirePagePermission } from "@/lib/auth/session";
import { proposalsOf } from "@/lib/proposals/views";

export const metadata: Metadata = { title: "Your proposals" };

const date = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

export default async function ProposalsPage() {
  const user = await requirePagePermission("proposals:create", "/proposals");
  const rows = await proposalsOf(user.id);
  const sentBack = rows.filter((r) => r.status === "changes_requested").length;

  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-1">
          <h1 className="text-3xl">Your proposals</h1>
          <p className="text-ink-soft">Every cross you proposed, newest first, with what the moderator said.</p>
        </div>
        <Link
          href="/propose"
          className={
            "inline-flex min-h-12 items-center rounded-md bg-ink px-5 font-bold " +
            "text-ground no-underline hover:bg-ink-soft"
          }
        >
          Propose a cross
        </Link>
      </header>
      {sentBack > 0 && (
        <Notice tone="caution">
          {sentBack === 1 ? "One proposal was" : `${sentBack} proposals were`} sent back to you. Change{" "}
          {sentBack === 1 ? "it" : "them"} and send again.
        </Notice>
      )}
      {rows.length === 0 ? (
        <Notice>
          You have not proposed a cross yet. When you have fitted a standard part in place of an obsolete one, tell the
          others.
        </Notice>
      ) : (
        <ul className="space-y-3" aria-label="Proposals">
          {rows.map((r) => (
            <li
              key={r.id}
              className="space-y-2 rounded-lg border border-rule bg-ground-raised p-4"
              data-testid="proposal"
            >
              <div className="flex flex-wrap items-center gap-3">
                <StatusBadge status={r.status} />
                <span className="text-sm text-ink-soft">
                  <Link href={`/proposals/${r.id}`}>#{r.id}, open it</Link> · sent {date(r.createdAt)}
                  {r.confirmations > 0 &&
                    ` · ${r.confirmations} ${r.confirmations === 1 ? "member" : "members"} fitted the same`}
                </span>
              </div>
              <p className="num text-xl">
                {r.partId ? <Link href={`/parts/${r.partId}`}>{r.partNumber}</Link> : r.partNumber}{" "}
                <span aria-label="replaced by">→</span> <strong>{r.standard}</strong>
              </p>
              <p className="flex flex-wrap items-center gap-3 text-sm">
                <span>
                  {r.maker} · {r.categoryName}
                </span>
                <FitBadge fit={r.fit} />
              </p>
              {r.moderatorMessage && (
                <p className="border-l-2 border-brass pl-2">
                  <span className="font-bold">Moderator: </span>
                  {r.moderatorMessage}
                </p>
              )}
              <div className="flex flex-wrap gap-4">
                {r.status === "changes_requested" && (
                  <Link href={`/proposals/${r.id}/edit`} className="font-bold">
                    Change and send again
                  </Link>
                )}
                {(r.status === "pending" || r.status === "changes_requested") && <WithdrawButton id={r.id} />}
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
