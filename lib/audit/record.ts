import type { Transaction } from "sequelize";
import { QueryTypes } from "sequelize";
import { AuditEvent, sequelize } from "@/db";
import type { AuditAction, AuditSubject } from "@/lib/audit/actions";

export interface AuditEntry {
  actorId: string | null;
  action: AuditAction;
  subjectType: AuditSubject;
  subjectId: string | number;
  before?: Record<string, unknown> | null;
  after?: Record<string, unknown> | null;
}

/** Written in the same transaction as the change it describes, so the log never claims what did not happen. */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await AuditEvent.create(
    {
      actorId: entry.actorId,
      action: entry.action,
      subjectType: entry.subjectType,
      subjectId: String(entry.subjectId),
      before: entry.before ?? null,
      after: entry.after ?? null,
    },
    { transaction },
  );
}

export interface AuditRow {
  id: number;
  at: string;
  actor: string | null;
  action: string;
  subjectType: string;
  subjectId: string;
  /** The account's e-mail address when the entry is about an account. */
  subjectEmail: string | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

/** Newest first, a page at a time: `before` is the smallest id of the previous page. */
export async function listAudit(limit: number, before?: number): Promise<{ events: AuditRow[]; next: number | null }> {
  const rows = await sequelize.query<{
    id: string;
    created_at: Date;
    email: string | null;
    subject_email: string | null;
    action: string;
    subject_type: string;
    subject_id: string;
    before: Record<string, unknown> | null;
    after: Record<string, unknown> | null;
  }>(
    `SELECT a.id, a.created_at, u.email, s.email AS subject_email, a.action, a.subject_type, a.subject_id, a.before,
      a.after
     FROM audit_events a LEFT JOIN users u ON u.id = a.actor_id LEFT JOIN users s ON a.subject_type = 'user' AND s.id =
       a.subject_id
     ${before ? "WHERE a.id < :before" : ""}
     ORDER BY a.id DESC LIMIT :limit`,
    { replacements: { before: before ?? null, limit: limit + 1 }, type: QueryTypes.SELECT },
  );
  const events = rows.slice(0, limit).map((r) => ({
    id: Number(r.id),
    at: r.created_at.toISOString(),
    actor: r.email,
    action: r.action,
    subjectType: r.subject_type,
    subjectId: r.subject_id,
    subjectEmail: r.subject_email,
    before: r.before,
    after: r.after,
  }));
  return { events, next: rows.length > limit ? events[events.length - 1].id : null };
}
