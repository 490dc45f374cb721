import { QueryTypes } from "sequelize";
import { sequelize } from "@/db";
import { env } from "@/lib/env";
import { sendMail, trySend } from "@/lib/mail/send";
import { digestMail, type DigestItem } from "@/lib/mail/templates";

export interface DigestResult {
  proposals: number;
  recipients: number;
  sent: number;
}

/**
 * One summary mail to each reviewer (moderators and admins who keep notifications on) listing the proposals that
 * arrived since the last summary. Proposals are marked as summarised only when at least one mail went out, so a
 * mail server that is down means the next run tries again; rows are locked so two runs never send the same list.
 */
export async function sendProposalDigest(): Promise<DigestResult> {
  return sequelize.transaction(async (transaction) => {
    const items = await sequelize.query<{ id: number; part_number: string; standard: string; created_at: Date }>(
      `SELECT s.id, COALESCE(p.number, s.new_part->>'number') AS part_number, COALESCE(sp.designation,
        s.new_standard->>'designation') AS standard, s.created_at
       FROM proposals s LEFT JOIN original_parts p ON p.id = s.original_part_id LEFT JOIN standard_parts sp ON sp.id
         = s.standard_part_id
       WHERE s.status = 'pending' AND s.digest_sent_at IS NULL
       ORDER BY s.created_at, s.id
       FOR UPDATE OF s SKIP LOCKED`,
      { type: QueryTypes.SELECT, transaction },
    );
    if (items.length === 0) return { proposals: 0, recipients: 0, sent: 0 };
    const [{ waiting }] = await sequelize.query<{ waiting: string }>(
      "SELECT count(*) AS waiting FROM proposals WHERE status = 'pending'",
      { type: QueryTypes.SELECT, transaction },
    );
    const reviewers = await sequelize.query<{ email: string }>(
      `SELECT email FROM users WHERE role IN ('moderator', 'admin') AND ` +
        `notify_by_email AND email_verified_at IS NOT NULL ORDER BY email`,
      { type: QueryTypes.SELECT, transaction },
    );
    const list: DigestItem[] = items.map((i) => ({
      id: i.id,
      partNumber: i.part_number,
      standard: i.standard,
      submittedAt: i.created_at.toISOString().slice(0, 16).replace("T", " ") + " UTC",
    }));
    let sent = 0;
    for (const r of reviewers) {
      if (await trySend(() => sendMail(digestMail(r.email, list, `${env.APP_URL}/review`, Number(waiting))))) sent += 1;
    }
    if (sent > 0 || reviewers.length === 0) {
      await sequelize.query("UPDATE proposals SET digest_sent_at = now() WHERE id IN (:ids)", {
        replacements: { ids: items.map((i) => i.id) },
        transaction,
      });
    }
    return { proposals: items.length, recipients: reviewers.length, sent };
  });
}
