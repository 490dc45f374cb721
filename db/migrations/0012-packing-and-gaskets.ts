import type { QueryInterface } from "sequelize";

/**
 * Gland packing becomes a part category and a kind of standard part, and a gasket cut to a template a kind of standard
 * part beside gasket sheet. PostgreSQL adds an enum value in place; taking one away means rebuilding the type, which
 * down does only when no row uses the value.
 */
const ADDED = [
  { type: "enum_original_parts_category", table: "original_parts", column: "category", values: ["packing"] },
  { type: "enum_standard_parts_kind", table: "standard_parts", column: "kind", values: ["packing", "gasket"] },
];

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const { type, values } of ADDED)
    for (const value of values) await qi.sequelize.query(`ALTER TYPE ${type} ADD VALUE IF NOT EXISTS '${value}'`);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    for (const { type, table, column, values } of ADDED) {
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
