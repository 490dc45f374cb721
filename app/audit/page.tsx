import type { Metadata } from "next";
import Link from "next/link";
import { EmailAddress } from "@/components/ui/email-address";
import { auditActionWords, auditChangeWords, auditSubjectWords } from "@/lib/audit/actions";
import { listAudit, type AuditRow } from "@/lib/audit/record";
import { requirePagePermission } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Audit log" };

/** The record an entry is about, linked where an admin can open it. */
function Subject({ event }: { event: AuditRow }) {
  const words = `${auditSubjectWords(event.subjectType)} #${event.subjectId}`;
  if (event.subjectType === "proposal") return <Link href={`/review/${event.subjectId}`}>{words}</Link>;
  if (event.subjectType === "import") return <Link href={`/admin/imports/${event.subjectId}`}>{words}</Link>;
  if (event.subjectType === "user")
    return event.subjectEmail ? <EmailAddress address={event.subjectEmail} /> : <>a deleted account</>;
  return <>{words}</>;
}

export default async function AuditPage({ searchParams }: { searchParams: Promise<{ before?: string }> }) {
  await requirePagePermission("audit:read", "/audit");
  const before = Number((await searchParams).before);
  const { events, next } = await listAudit(100, Number.isInteger(before) && before > 0 ? before : undefined);
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-3xl">Audit log</h1>
        <p className="text-ink-soft">
          Who changed what, newest first. Each entry keeps the record as it was before and after the change.
        </p>
      </header>
      <div className="rounded-lg border border-rule bg-ground-raised">
        <table className="stack-table w-full text-left text-sm">
          <thead className="bg-ground-sunk">
            <tr>
              <th scope="col" className="p-3">
                When (UTC)
              </th>
              <th scope="col" className="p-3">
                Who
              </th>
              <th scope="col" className="p-3">
                What
              </th>
              <th scope="col" className="p-3">
                Record
              </th>
              <th scope="col" className="p-3">
                Changed
              </th>
            </tr>
          </thead>
          <tbody>
            {events.map((e) => (
              <tr key={e.id} className="border-t border-rule align-top" data-testid="audit-row">
                <td className="p-3 num" data-label="When (UTC)">
                  {e.at.slice(0, 19).replace("T", " ")}
                </td>
                <td className="p-3" data-label="Who">
                  {e.actor ? <EmailAddress address={e.actor} /> : "—"}
                </td>
                <td className="p-3" data-label="What">
                  <span className="font-bold">{auditActionWords(e.action).toLowerCase()}</span>
                </td>
                <td className="p-3" data-label="Record">
                  <Subject event={e} />
                </td>
                <td className="col-span-2 p-3 lg:min-w-64" data-label="Changed">
                  {auditChangeWords(e.before, e.after)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {next && (
        <p>
          <Link href={`/audit?before=${next}`}>Older entries →</Link>
        </p>
      )}
    </div>
  );
}
