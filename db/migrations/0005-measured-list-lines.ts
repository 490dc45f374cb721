import { DataTypes, type QueryInterface } from "sequelize";

// A job list line may be a standard part worked out by a calculator from measurements, with no factory part behind
// it: `part_id` is then null and `standard_item` holds what to order (kind, designation, sizes).
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.addColumn("job_list_lines", "standard_item", { type: DataTypes.JSONB, allowNull: true }, t);
    await qi.sequelize.query("ALTER TABLE job_list_lines ALTER COLUMN part_id DROP NOT NULL", t);
    await qi.sequelize.query(
      `ALTER TABLE job_list_lines ADD CONSTRAINT job_list_lines_part_or_item
       CHECK ((part_id IS NOT NULL AND standard_item IS NULL) OR (part_id IS NULL AND standard_item IS NOT NULL))`,
      t,
    );
    // One line for each measured standard part on a list: adding it again raises the quantity.
    await qi.sequelize.query(
      `CREATE UNIQUE INDEX job_list_lines_list_item ON job_list_lines (list_id, (standard_item->>'kind'),
        upper(standard_item->>'designation'))
       WHERE part_id IS NULL`,
      t,
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.sequelize.query("DELETE FROM job_list_lines WHERE part_id IS NULL", t);
    await qi.sequelize.query("DROP INDEX IF EXISTS job_list_lines_list_item", t);
    await qi.sequelize.query("ALTER TABLE job_list_lines DROP CONSTRAINT IF EXISTS job_list_lines_part_or_item", t);
    await qi.sequelize.query("ALTER TABLE job_list_lines ALTER COLUMN part_id SET NOT NULL", t);
    await qi.removeColumn("job_list_lines", "standard_item", t);
  });
}
