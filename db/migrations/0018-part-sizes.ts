import type { QueryInterface } from "sequelize";

/**
 * Measured-size search flat in the catalogue's size. A catalogue holds many parts of one size (a 25 × 52 mm
 * bearing fits hundreds of machines), so a nearest-first index on the parts themselves reads more entries at
 * each size as the catalogue grows. Instead each distinct size of each kind is kept once, with how many parts have
 * it, in `part_sizes`, searched nearest first through a GiST index; the parts of each near size are then read in
 * number order through a btree (lib/catalogue/find-by-size.ts). Statement triggers keep the counts, so a COPY of
 * 100,000 parts writes them in one pass; the rows are written in key order, so two writers cannot deadlock.
 */
const sizeOf = (table: string) =>
  `SELECT category, coalesce(inner_mm, 0)::float8 AS inner_mm, outer_mm::float8 AS outer_mm
   FROM ${table} WHERE outer_mm IS NOT NULL`;

/** Adds each (kind, inner, outer) delta to its count, in key order, then drops the sizes left with no part. */
const apply = (deltas: string, touched: string) => `
  INSERT INTO part_sizes AS s (category, inner_mm, outer_mm, parts)
    SELECT category, inner_mm, outer_mm, sum(n)::integer FROM (${deltas}) d
    GROUP BY category, inner_mm, outer_mm HAVING sum(n) <> 0
    ORDER BY category, inner_mm, outer_mm
  ON CONFLICT (category, inner_mm, outer_mm) DO UPDATE SET parts = s.parts + excluded.parts;
  DELETE FROM part_sizes s USING (${sizeOf(touched)}) t
    WHERE s.parts <= 0 AND s.category = t.category AND s.inner_mm = t.inner_mm AND s.outer_mm = t.outer_mm;`;

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(
      `CREATE TABLE part_sizes (
         category enum_original_parts_category NOT NULL,
         inner_mm float8 NOT NULL,
         outer_mm float8 NOT NULL,
         parts integer NOT NULL,
         PRIMARY KEY (category, inner_mm, outer_mm)
       )`,
    );
    await q(
      `INSERT INTO part_sizes (category, inner_mm, outer_mm, parts)
       SELECT category, inner_mm, outer_mm, count(*) FROM (${sizeOf("original_parts")}) p
       GROUP BY category, inner_mm, outer_mm`,
    );
    await q("CREATE INDEX part_sizes_nearest ON part_sizes USING gist (category, (point(inner_mm, outer_mm)))");
    await q(
      `CREATE INDEX original_parts_by_size ON original_parts
         (category, (coalesce(inner_mm, 0)::float8), (outer_mm::float8), number COLLATE "C")
       WHERE outer_mm IS NOT NULL`,
    );
    await q("DROP INDEX original_parts_nearest_size");
    await q(
      `CREATE FUNCTION add_part_sizes() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN ${apply(`SELECT *, 1 AS n FROM (${sizeOf("added")}) a`, "added")} RETURN NULL; END $$`,
    );
    await q(
      `CREATE FUNCTION remove_part_sizes() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN ${apply(`SELECT *, -1 AS n FROM (${sizeOf("gone")}) g`, "gone")} RETURN NULL; END $$`,
    );
    await q(
      `CREATE FUNCTION renew_part_sizes() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN ${apply(
         `SELECT *, 1 AS n FROM (${sizeOf("changed")}) c UNION ALL SELECT *, -1 AS n FROM (${sizeOf("was")}) w`,
         "was",
       )} RETURN NULL; END $$`,
    );
    await q(
      `CREATE TRIGGER original_parts_add_sizes AFTER INSERT ON original_parts
       REFERENCING NEW TABLE AS added FOR EACH STATEMENT EXECUTE FUNCTION add_part_sizes()`,
    );
    await q(
      `CREATE TRIGGER original_parts_remove_sizes AFTER DELETE ON original_parts
       REFERENCING OLD TABLE AS gone FOR EACH STATEMENT EXECUTE FUNCTION remove_part_sizes()`,
    );
    await q(
      `CREATE TRIGGER original_parts_renew_sizes AFTER UPDATE ON original_parts
       REFERENCING OLD TABLE AS was NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION renew_part_sizes()`,
    );
    await q("ANALYZE part_sizes");
    await q("ANALYZE original_parts");
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    for (const [trigger, fn] of [
      ["original_parts_renew_sizes", "renew_part_sizes"],
      ["original_parts_remove_sizes", "remove_part_sizes"],
      ["original_parts_add_sizes", "add_part_sizes"],
    ]) {
      await q(`DROP TRIGGER ${trigger} ON original_parts`);
      await q(`DROP FUNCTION ${fn}()`);
    }
    await q("DROP TABLE part_sizes");
    await q("DROP INDEX original_parts_by_size");
    await q(
      `CREATE INDEX original_parts_nearest_size ON original_parts USING gist
         (category, (point(coalesce(inner_mm, 0)::float8, outer_mm::float8)))
       WHERE outer_mm IS NOT NULL`,
    );
  });
}
