import { sequelize, User } from "@/db";
import { recordAudit } from "@/lib/audit/record";
import { AppError } from "@/lib/errors";

/** Whether Understudy may e-mail this member about their proposals. */
export async function notificationsOf(userId: string): Promise<boolean> {
  const row = await User.findByPk(userId, { attributes: ["notifyByEmail"] });
  if (!row) throw new AppError("not_found", "There is no account with that id.");
  return row.notifyByEmail;
}

/** Turns the e-mails on or off; the change and its audit entry are written together, or neither is. */
export async function setNotifications(userId: string, notifyByEmail: boolean): Promise<{ notifyByEmail: boolean }> {
  await sequelize.transaction(async (transaction) => {
    await User.update({ notifyByEmail }, { where: { id: userId }, transaction });
    await recordAudit(
      {
        actorId: userId,
        action: "account.notifications",
        subjectType: "user",
        subjectId: userId,
        after: { notifyByEmail },
      },
      transaction,
    );
  });
  return { notifyByEmail };
}
