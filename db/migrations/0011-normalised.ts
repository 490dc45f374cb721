import type { QueryInterface } from "sequelize";

/** One spelling: a factory number's `normalised` form, in the column, its indexes and the proposals that carry one. */
async function respell(qi: QueryInterface, from: string, to: string, fromKey: string, toKey: string): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(`ALTER TABLE original_parts RENAME COLUMN number_${from} TO number_${to}`);
    const [indexes] = (await q(
      `SELECT relname FROM pg_class WHERE relkind = 'i' AND relname LIKE '%number_${from}%'
       AND relnamespace = 'public'::regnamespace`,
    )) as [Array<{ relname: string }>, unknown];
    for (const { relname } of indexes) await q(`ALTER INDEX "${relname}" RENAME TO "${relname.replace(from, to)}"`);
    await q(
      `UPDATE proposals
       SET new_part = (new_part - '${fromKey}') || jsonb_build_object('${toKey}', new_part->'${fromKey}')
       WHERE jsonb_exists(new_part, '${fromKey}')`,
    );
  });
}

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await respell(qi, "normalized", "normalised", "numberNormalized", "numberNormalised");
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await respell(qi, "normalised", "normalized", "numberNormalised", "numberNormalized");
}
