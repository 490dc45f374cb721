import type { QueryInterface } from "sequelize";

/**
 * One name for one thing: the screens always said "proposal"; now the tables, columns, indexes, constraints, enum
 * types and audit entries do too (they said "submission").
 */
async function rename(qi: QueryInterface, from: string, to: string): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    const swap = (name: string) => name.replaceAll(`${from}s`, `${to}s`).replaceAll(from, to);
    await q(`ALTER TABLE ${from}s RENAME TO ${to}s`);
    await q(`ALTER TABLE ${from}_photos RENAME TO ${to}_photos`);
    await q(`ALTER TABLE ${to}_photos RENAME COLUMN ${from}_id TO ${to}_id`);
    await q(`ALTER TABLE confirmations RENAME COLUMN ${from}_id TO ${to}_id`);
    const [constraints] = (await q(
      `SELECT conrelid::regclass::text AS owner, conname FROM pg_constraint WHERE conname LIKE '%${from}%'`,
    )) as [Array<{ owner: string; conname: string }>, unknown];
    for (const c of constraints) {
      await q(`ALTER TABLE ${c.owner} RENAME CONSTRAINT "${c.conname}" TO "${swap(c.conname)}"`);
    }
    // Indexes that are not behind a constraint, and the id sequences.
    const [relations] = (await q(
      `SELECT relname, relkind FROM pg_class WHERE relname LIKE '%${from}%' AND relkind IN ('i', 'S')
       AND relnamespace = 'public'::regnamespace`,
    )) as [Array<{ relname: string; relkind: string }>, unknown];
    for (const r of relations) {
      await q(`ALTER ${r.relkind === "S" ? "SEQUENCE" : "INDEX"} "${r.relname}" RENAME TO "${swap(r.relname)}"`);
    }
    await q(`ALTER TYPE enum_${from}s_status RENAME TO enum_${to}s_status`);
    await q(`ALTER TYPE enum_${from}s_fit RENAME TO enum_${to}s_fit`);
    await q(`UPDATE audit_events SET subject_type = '${to}' WHERE subject_type = '${from}'`);
    await q(`UPDATE audit_events SET action = replace(action, '${from}.', '${to}.') WHERE action LIKE '${from}.%'`);
  });
}

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await rename(qi, "submission", "proposal");
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await rename(qi, "proposal", "submission");
}
