import type { Transaction } from "sequelize";
import { sequelize } from "@/db/sequelize";

/**
 * Makes every transaction that takes the same key wait its turn until the first one ends (a PostgreSQL advisory
 * lock), so that check-then-write is a single step: forty proposals at once cannot all pass a limit of twenty, and
 * two sign-ups of one address cannot both find it free.
 */
export async function takeTurn(transaction: Transaction, key: string): Promise<void> {
  await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key }, transaction });
}
