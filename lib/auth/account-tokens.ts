import { sha256 } from "@oslojs/crypto/sha2";
import { encodeBase32LowerCaseNoPadding, encodeHexLowerCase } from "@oslojs/encoding";
import { createDate, isWithinExpirationDate, TimeSpan } from "oslo";
import type { Transaction } from "sequelize";
import { AccountToken, type AccountTokenPurpose } from "@/db/models/account-token";

const lifetimes: Record<AccountTokenPurpose, TimeSpan> = {
  verify_email: new TimeSpan(48, "h"),
  reset_password: new TimeSpan(1, "h"),
};

function hashToken(token: string): string {
  return encodeHexLowerCase(sha256(new TextEncoder().encode(token)));
}

/** Issues a fresh one-time secret for the link; earlier unused ones of the same purpose stop working. */
export async function issueAccountToken(
  userId: string,
  purpose: AccountTokenPurpose,
  transaction?: Transaction,
): Promise<string> {
  const bytes = crypto.getRandomValues(new Uint8Array(20));
  const token = encodeBase32LowerCaseNoPadding(bytes);
  await AccountToken.destroy({ where: { userId, purpose }, transaction });
  await AccountToken.create(
    { tokenHash: hashToken(token), userId, purpose, expiresAt: createDate(lifetimes[purpose]) },
    { transaction },
  );
  return token;
}

/** Spends a token: returns its user id when it is known, of that purpose and not expired; it can be used once. */
export async function consumeAccountToken(
  token: string,
  purpose: AccountTokenPurpose,
  transaction: Transaction,
): Promise<string | null> {
  const row = await AccountToken.findOne({
    where: { tokenHash: hashToken(token), purpose },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row) return null;
  await row.destroy({ transaction });
  return isWithinExpirationDate(row.expiresAt) ? row.userId : null;
}
