import type { QueryInterface } from "sequelize";

/** Values added to a column's enum type: PostgreSQL adds them in place. */
export interface EnumValues {
  type: string;
  table: string;
  column: string;
  values: string[];
}

export async function addEnumValues(qi: QueryInterface, added: EnumValues[]): Promise<void> {
  for (const { type, values } of added)
    for (const value of values) await qi.sequelize.query(`ALTER TYPE ${type} ADD VALUE IF NOT EXISTS '${value}'`);
}

/**
 * Takes added values out again by rebuilding each type without them, in one transaction; refuses while a row uses
 * one of them.
 */
export async function removeEnumValues(qi: QueryInterface, added: EnumValues[]): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    for (const { type, table, column, values } of added) {
      const [used] = await qi.sequelize.query(
        `SELECT count(*)::int AS n FROM ${table} WHERE ${column}::text IN (${values.map((v) => `'${v}'`).join(", ")})`,
        { transaction },
      );
      if ((used as Array<{ n: number }>)[0].n > 0)
        throw new Error(`${table} has rows of ${values.join(" or ")}: move them to another ${column} first.`);
      const [rows] = await qi.sequelize.query(
        `SELECT e.enumlabel AS label FROM pg_enum e JOIN pg_type t ON t.oid = e.enumtypid
         WHERE t.typname = '${type}' ORDER BY e.enumsortorder`,
        { transaction },
      );
      const kept = (rows as Array<{ label: string }>).map((r) => r.label).filter((l) => !values.includes(l));
      await qi.sequelize.query(`ALTER TYPE ${type} RENAME TO ${type}_old`, { transaction });
      await qi.sequelize.query(`CREATE TYPE ${type} AS ENUM (${kept.map((l) => `'${l}'`).join(", ")})`, {
        transaction,
      });
      await qi.sequelize.query(
        `ALTER TABLE ${table} ALTER COLUMN ${column} TYPE ${type} USING ${column}::text::${type}`,
        { transaction },
      );
      await qi.sequelize.query(`DROP TYPE ${type}_old`, { transaction });
    }
  });
}
