import { QueryTypes } from "sequelize";
import { sequelize, SignInFailure } from "@/db";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

export interface ThrottleKeys {
  account: string;
  address: string;
}

function limits(keys: ThrottleKeys): Array<[string, number]> {
  return [
    [`account:${keys.account}`, env.AUTH_MAX_FAILURES_PER_ACCOUNT],
    [`address:${keys.address}`, env.AUTH_MAX_FAILURES_PER_ADDRESS],
  ];
}

const windowMs = () => env.AUTH_FAILURE_WINDOW_MINUTES * 60_000;

/** Refuses a sign-in attempt, before the password is even checked, once either key has used up its failures. */
export async function assertSignInAllowed(keys: ThrottleKeys): Promise<void> {
  const now = Date.now();
  for (const [key, max] of limits(keys)) {
    const row = await SignInFailure.findByPk(key);
    if (!row) continue;
    const windowEnds = row.windowStartedAt.getTime() + windowMs();
    if (windowEnds > now && row.failures >= max) {
      const retryAfterSeconds = Math.ceil((windowEnds - now) / 1000);
      throw new AppError(
        "rate_limited",
        `Too many failed sign-ins. Wait ${Math.ceil(retryAfterSeconds / 60)} minutes, or reset your password.`,
        { retryAfterSeconds },
      );
    }
  }
}

/** Counts one failure against both keys; a window that has run out starts again at one. */
export async function recordSignInFailure(keys: ThrottleKeys): Promise<void> {
  const cutoff = new Date(Date.now() - windowMs());
  for (const [key] of limits(keys)) {
    await sequelize.query(
      `INSERT INTO sign_in_failures (key, failures, window_started_at) VALUES (:key, 1, now())
       ON CONFLICT (key) DO UPDATE SET
         failures = CASE WHEN sign_in_failures.window_started_at < :cutoff THEN 1 ELSE sign_in_failures.failures + 1 END,
         window_started_at = CASE WHEN sign_in_failures.window_started_at < :cutoff THEN now() ELSE sign_in_failures.window_started_at END`,
      { replacements: { key, cutoff }, type: QueryTypes.INSERT },
    );
  }
}

export async function clearAccountFailures(account: string): Promise<void> {
  await SignInFailure.destroy({ where: { key: `account:${account}` } });
}
