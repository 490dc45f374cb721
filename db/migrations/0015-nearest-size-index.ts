import type { QueryInterface } from "sequelize";

/**
 * Measured-size search through an index that returns the nearest sizes first: a GiST index on each part's kind and
 * its (inner, outer) diameters as a point, searched inside the tolerance window's box and ordered by distance, so a
 * search reads about as many rows as it returns, whatever the size of the catalogue (lib/catalogue/find-by-size.ts).
 * A part known by its outside alone (a plug) has 0 for its inside. btree_gist lets the kind (an enum) share the
 * index.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q("CREATE EXTENSION IF NOT EXISTS btree_gist");
    await q(
      `CREATE INDEX original_parts_nearest_size ON original_parts USING gist
         (category, (point(coalesce(inner_mm, 0)::float8, outer_mm::float8)))
       WHERE outer_mm IS NOT NULL`,
    );
    await q("DROP INDEX IF EXISTS original_parts_category_inner_mm_outer_mm");
    // The planner's statistics of the index's expressions, without which it misjudges how many rows a window holds.
    await q("ANALYZE original_parts");
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q("DROP INDEX original_parts_nearest_size");
    await q("CREATE INDEX original_parts_category_inner_mm_outer_mm ON original_parts (category, inner_mm, outer_mm)");
  });
}
