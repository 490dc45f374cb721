import type { QueryInterface } from "sequelize";

/**
 * Numbers one character away from a typed one share its first half or its last half exactly. With the prefix index
 * (0008) on the first half, this index on the reversed number serves the last half, so "similar numbers" after an
 * exact hit are found without a trigram search, which is slow on catalogues of look-alike numbers. fuzzystrmatch
 * (a contrib module of PostgreSQL, like pg_trgm) gives the edit distance to keep the ones one character away.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query("CREATE EXTENSION IF NOT EXISTS fuzzystrmatch", { transaction });
    await qi.sequelize.query(
      "CREATE INDEX original_parts_number_key_reversed ON original_parts (reverse(number_key) text_pattern_ops)",
      { transaction },
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query("DROP INDEX IF EXISTS original_parts_number_key_reversed");
  await qi.sequelize.query("DROP EXTENSION IF EXISTS fuzzystrmatch");
}
