import { QueryTypes } from "sequelize";
import { sequelize } from "@/db";
import { takeTurn } from "@/lib/concurrency/take-turn";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

export interface ThrottleKeys {
  account: string;
  address: string;
}

/**
 * Three counts of sign-in attempts per window, each with its own limit:
 * - one address on one account (5): someone guessing a member's password is stopped quickly, but only from where
 *   they are guessing, so a stranger cannot lock the member out of their own account;
 * - one address on any accounts (20): one machine trying many accounts;
 * - one account from anywhere (50): guessing spread over many addresses, a slower back-off for the account.
 */
function limits(keys: ThrottleKeys): Array<[string, number]> {
  return [
    [`pair:${keys.account}|${keys.address}`, env.AUTH_MAX_FAILURES_PER_ACCOUNT],
    [`address:${keys.address}`, env.AUTH_MAX_FAILURES_PER_ADDRESS],
    [`account:${keys.account}`, env.AUTH_MAX_FAILURES_ACCOUNT_WIDE],
  ];
}

const windowMs = () => env.AUTH_FAILURE_WINDOW_MINUTES * 60_000;

/**
 * Checks the three counts and, when all are under their limits, counts this attempt against each, in one step: the
 * attempts on one account and from one address take turns in the database, so forty at once cannot all pass a limit
 * of five. A refused attempt counts against nothing. Call before checking the password.
 */
export async function takeSignInAttempt(keys: ThrottleKeys): Promise<void> {
  const cutoff = new Date(Date.now() - windowMs());
  await sequelize.transaction(async (transaction) => {
    // Always the account first, then the address: two attempts never wait on each other the other way round.
    await takeTurn(transaction, `sign-in-account:${keys.account}`);
    await takeTurn(transaction, `sign-in-address:${keys.address}`);
    const rows = await sequelize.query<{ key: string; failures: number; window_started_at: Date }>(
      "SELECT key, failures, window_started_at FROM sign_in_failures WHERE key IN (:keys)",
      { replacements: { keys: limits(keys).map(([key]) => key) }, type: QueryTypes.SELECT, transaction },
    );
    const now = Date.now();
    for (const [key, max] of limits(keys)) {
      const row = rows.find((r) => r.key === key);
      if (!row || row.window_started_at < cutoff || row.failures < max) continue;
      const retryAfterSeconds = Math.max(1, Math.ceil((row.window_started_at.getTime() + windowMs() - now) / 1000));
      throw new AppError(
        "rate_limited",
        `Too many failed sign-ins. Wait ${Math.ceil(retryAfterSeconds / 60)} minutes, or reset your password.`,
        {
          retryAfterSeconds,
        },
      );
    }
    for (const [key] of limits(keys)) {
      await sequelize.query(
        `INSERT INTO sign_in_failures (key, failures, window_started_at) VALUES (:key, 1, now())
         ON CONFLICT (key) DO UPDATE SET
           failures = CASE WHEN sign_in_failures.window_started_at < :cutoff THEN 1 ELSE sign_in_failures.failures + 1
             END,
           window_started_at = CASE WHEN sign_in_failures.window_started_at < :cutoff THEN now() ELSE
             sign_in_failures.window_started_at END`,
        { replacements: { key, cutoff }, type: QueryTypes.INSERT, transaction },
      );
    }
  });
}

/**
 * After a right password: this attempt was no failure, so it is taken back from the address's and the account's
 * counts, and the guesses made from this address on this account are forgiven. Guesses from elsewhere still count.
 */
export async function settleSuccessfulSignIn(keys: ThrottleKeys): Promise<void> {
  const [pair, address, account] = limits(keys).map(([key]) => key);
  await sequelize.transaction(async (transaction) => {
    await sequelize.query("DELETE FROM sign_in_failures WHERE key = :pair", { replacements: { pair }, transaction });
    await sequelize.query("UPDATE sign_in_failures SET failures = greatest(failures - 1, 0) WHERE key IN (:keys)", {
      replacements: { keys: [address, account] },
      transaction,
    });
  });
}

/** A new password (set through the e-mailed link) wipes the account's counts: its owner has proved who they are. */
export async function clearAccountFailures(account: string): Promise<void> {
  await sequelize.query("DELETE FROM sign_in_failures WHERE key = :account OR key LIKE :pairs", {
    replacements: { account: `account:${account}`, pairs: `pair:${account.replace(/[\\%_]/g, "\\$&")}|%` },
  });
}
