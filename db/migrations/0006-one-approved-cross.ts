import type { QueryInterface } from "sequelize";

// One approved cross for each part and standard part (or repair method): the database itself refuses a second, so
// two approvals that race leave one cross, and the second approval is counted as a confirmation of it.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    // Any duplicates already there are merged into the oldest: confirmations move over (once per member), proposals
    // point at it, and the later copies are set aside as rejected with a note that says where they went.
    await qi.sequelize.query(
      `CREATE TEMP TABLE cross_merges ON COMMIT DROP AS
       SELECT c.id AS dup, k.keep FROM crosses c
       JOIN (SELECT original_part_id, coalesce(standard_part_id, 0) AS s, coalesce(lower(repair_method), '') AS r,
         min(id) AS keep
             FROM crosses WHERE status = 'approved' GROUP BY 1, 2, 3 HAVING count(*) > 1) k
         ON k.original_part_id = c.original_part_id AND k.s = coalesce(c.standard_part_id, 0) AND k.r =
           coalesce(lower(c.repair_method), '')
       WHERE c.status = 'approved' AND c.id <> k.keep`,
      t,
    );
    await qi.sequelize.query(
      `UPDATE confirmations f SET cross_id = m.keep FROM cross_merges m
       WHERE f.cross_id = m.dup AND NOT EXISTS (SELECT 1 FROM confirmations o WHERE o.cross_id = m.keep AND o.user_id =
         f.user_id)`,
      t,
    );
    await qi.sequelize.query("DELETE FROM confirmations f USING cross_merges m WHERE f.cross_id = m.dup", t);
    await qi.sequelize.query(
      "UPDATE submissions s SET cross_id = m.keep FROM cross_merges m WHERE s.cross_id = m.dup",
      t,
    );
    await qi.sequelize.query(
      `UPDATE crosses c SET status = 'rejected', notes = concat_ws(' ', c.notes, '(Merged into cross #' || m.keep ||
        '.)'), updated_at = now()
       FROM cross_merges m WHERE c.id = m.dup`,
      t,
    );
    await qi.sequelize.query(
      `CREATE UNIQUE INDEX crosses_one_approved ON crosses (original_part_id, coalesce(standard_part_id, 0),
        coalesce(lower(repair_method), ''))
       WHERE status = 'approved'`,
      t,
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query("DROP INDEX IF EXISTS crosses_one_approved");
}
