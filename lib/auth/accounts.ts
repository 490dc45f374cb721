import { generateIdFromEntropySize } from "lucia";
import { sequelize, User } from "@/db";
import { consumeAccountToken, issueAccountToken } from "@/lib/auth/account-tokens";
import { lucia } from "@/lib/auth/lucia";
import { hashPassword, spendPasswordTime, verifyPassword } from "@/lib/auth/password";
import { passwordWeakness } from "@/lib/auth/password-strength";
import { accountUsable } from "@/lib/auth/demo-accounts";
import type { Role } from "@/lib/auth/roles";
import { clearAccountFailures, settleSuccessfulSignIn, takeSignInAttempt } from "@/lib/auth/throttle";
import { env } from "@/lib/env";
import { recordAudit } from "@/lib/audit/record";
import { takeTurn } from "@/lib/concurrency/take-turn";
import { AppError } from "@/lib/errors";
import { sendMail, trySend } from "@/lib/mail/send";
import { accountExistsMail, resetPasswordMail, verifyEmailMail } from "@/lib/mail/templates";

export interface AccountView {
  id: string;
  email: string;
  role: Role;
  emailVerified: boolean;
}

export function toAccountView(user: User): AccountView {
  return { id: user.id, email: user.email, role: user.role, emailVerified: user.emailVerifiedAt !== null };
}

const link = (path: string, token: string) => `${env.APP_URL}${path}?token=${encodeURIComponent(token)}`;

/** Mail is sent after the database work has committed; a mail failure is reported, never half-written. */
export const SIGN_IN_REFUSED = "That e-mail and password do not match an account.";

/**
 * Opens an account and mails the confirmation link. An address that already has an account gets a
 * "you already have an account" message instead, and the caller sees the same answer either way.
 */
/** A new password that is easy to guess is refused with the estimator's reason, on the password field. */
function assertStrongPassword(password: string, userInputs: string[]): void {
  const weakness = passwordWeakness(password, userInputs);
  if (weakness)
    throw new AppError("validation_failed", weakness, { field: "password", fields: { password: weakness } });
}

export async function signUp(input: { email: string; password: string }): Promise<{ mailSent: boolean }> {
  assertStrongPassword(input.password, [input.email]);
  const passwordHash = await hashPassword(input.password);
  const outcome = await sequelize.transaction(async (transaction) => {
    // Two sign-ups of one address at once take turns: the second finds the first's account, as a later one would.
    await takeTurn(transaction, `sign-up:${input.email.toLowerCase()}`);
    const existing = await User.findOne({ where: { email: input.email }, transaction });
    if (existing) {
      return {
        mail: accountExistsMail(
          input.email,
          link("/reset-password", await issueAccountToken(existing.id, "reset_password", transaction)),
        ),
      };
    }
    const user = await User.create(
      { id: generateIdFromEntropySize(10), email: input.email, passwordHash, role: "member", emailVerifiedAt: null },
      { transaction },
    );
    const token = await issueAccountToken(user.id, "verify_email", transaction);
    return { mail: verifyEmailMail(user.email, link("/verify-email", token)) };
  });
  return { mailSent: await trySend(() => sendMail(outcome.mail)) };
}

export async function resendVerification(email: string): Promise<{ mailSent: boolean }> {
  const user = await User.findOne({ where: { email } });
  if (!user || user.emailVerifiedAt) return { mailSent: true };
  const token = await issueAccountToken(user.id, "verify_email");
  return { mailSent: await trySend(() => sendMail(verifyEmailMail(user.email, link("/verify-email", token)))) };
}

export async function verifyEmail(token: string): Promise<AccountView> {
  return sequelize.transaction(async (transaction) => {
    const userId = await consumeAccountToken(token, "verify_email", transaction);
    const user = userId ? await User.findByPk(userId, { transaction }) : null;
    if (!user) {
      throw new AppError("validation_failed", "This confirmation link has expired or was already used.", {
        field: "token",
      });
    }
    user.emailVerifiedAt ??= new Date();
    await user.save({ transaction });
    return toAccountView(user);
  });
}

export async function signIn(input: {
  email: string;
  password: string;
  address: string;
}): Promise<{ user: AccountView; sessionId: string }> {
  const keys = { account: input.email, address: input.address };
  await takeSignInAttempt(keys);
  const found = await User.findOne({ where: { email: input.email } });
  // A demo account in production is answered exactly like an unknown address.
  const user = found && accountUsable(found.email, env.APP_ENV) ? found : null;
  const valid = user
    ? await verifyPassword(user.passwordHash, input.password)
    : (await spendPasswordTime(input.password), false);
  if (!user || !valid) throw new AppError("unauthenticated", SIGN_IN_REFUSED);
  await settleSuccessfulSignIn(keys);
  if (!user.emailVerifiedAt) {
    throw new AppError(
      "email_not_verified",
      "Confirm your e-mail address first: open the link we sent you, or ask for a new one below.",
      { field: "email" },
    );
  }
  const session = await lucia.createSession(user.id, {});
  return { user: toAccountView(user), sessionId: session.id };
}

export async function signOut(sessionId: string): Promise<void> {
  await lucia.invalidateSession(sessionId);
}

export async function requestPasswordReset(email: string): Promise<{ mailSent: boolean }> {
  const user = await User.findOne({ where: { email } });
  if (!user) return { mailSent: true };
  const token = await issueAccountToken(user.id, "reset_password");
  return { mailSent: await trySend(() => sendMail(resetPasswordMail(user.email, link("/reset-password", token)))) };
}

/** Sets the new password, confirms the address (the mail reached its owner) and signs out every other session. */
export async function resetPassword(input: { token: string; password: string }): Promise<AccountView> {
  assertStrongPassword(input.password, []);
  const passwordHash = await hashPassword(input.password);
  const user = await sequelize.transaction(async (transaction) => {
    const userId = await consumeAccountToken(input.token, "reset_password", transaction);
    const found = userId ? await User.findByPk(userId, { transaction }) : null;
    if (!found) {
      throw new AppError("validation_failed", "This link has expired or was already used. Ask for a new one.", {
        field: "token",
      });
    }
    found.passwordHash = passwordHash;
    found.emailVerifiedAt ??= new Date();
    await found.save({ transaction });
    return found;
  });
  await lucia.invalidateUserSessions(user.id);
  await clearAccountFailures(user.email);
  return toAccountView(user);
}

export async function listAccounts(): Promise<AccountView[]> {
  const users = await User.findAll({ order: [["createdAt", "ASC"]] });
  return users.map(toAccountView);
}

export async function setAccountRole(input: { actorId: string; userId: string; role: Role }): Promise<AccountView> {
  if (input.actorId === input.userId) {
    throw new AppError("validation_failed", "You cannot change your own role; ask another admin.", { field: "role" });
  }
  return sequelize.transaction(async (transaction) => {
    const user = await User.findByPk(input.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new AppError("not_found", "No account with that id.");
    const before = user.role;
    if (before !== input.role) {
      user.role = input.role;
      await user.save({ transaction });
      await recordAudit(
        {
          actorId: input.actorId,
          action: "account.role",
          subjectType: "user",
          subjectId: user.id,
          before: { role: before },
          after: { role: input.role },
        },
        transaction,
      );
    }
    return toAccountView(user);
  });
}
