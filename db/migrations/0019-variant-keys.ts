import type { QueryInterface } from "sequelize";

/**
 * Each form in `number_variants` also carries the whole key it was made from, and the form's index includes that key
 * and the part's id. The numbers one edit away from a typed one are then measured (`levenshtein()`) in the index
 * itself, and only those that pass are read from `original_parts`: the look-up reads as many parts as it may show,
 * not every part that shares a form. The table is rebuilt rather than updated in place, so it is not left with a
 * dead copy of every row.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(
      `CREATE TABLE number_variants_keyed (
         variant text NOT NULL,
         number_key text NOT NULL,
         part_id integer NOT NULL REFERENCES original_parts (id) ON DELETE CASCADE
       )`,
    );
    await q(
      `INSERT INTO number_variants_keyed (variant, number_key, part_id)
       SELECT f, p.number_key, p.id FROM original_parts p, number_forms(p.number_key) AS f`,
    );
    await q("DROP TABLE number_variants");
    await q("ALTER TABLE number_variants_keyed RENAME TO number_variants");
    await q("CREATE INDEX number_variants_variant ON number_variants (variant) INCLUDE (number_key, part_id)");
    await q("CREATE INDEX number_variants_part ON number_variants (part_id)");
    await q(
      `CREATE OR REPLACE FUNCTION add_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         INSERT INTO number_variants (variant, number_key, part_id)
           SELECT f, a.number_key, a.id FROM added a, number_forms(a.number_key) AS f;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE OR REPLACE FUNCTION renew_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         DELETE FROM number_variants v USING changed c JOIN was w ON w.id = c.id
           WHERE v.part_id = c.id AND w.number_key <> c.number_key;
         INSERT INTO number_variants (variant, number_key, part_id)
           SELECT f, c.number_key, c.id FROM changed c JOIN was w ON w.id = c.id, number_forms(c.number_key) AS f
           WHERE w.number_key <> c.number_key;
         RETURN NULL;
       END $$`,
    );
    await q("ANALYZE number_variants");
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(
      `CREATE OR REPLACE FUNCTION add_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         INSERT INTO number_variants (variant, part_id) SELECT f, a.id FROM added a, number_forms(a.number_key) AS f;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE OR REPLACE FUNCTION renew_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         DELETE FROM number_variants v USING changed c JOIN was w ON w.id = c.id
           WHERE v.part_id = c.id AND w.number_key <> c.number_key;
         INSERT INTO number_variants (variant, part_id)
           SELECT f, c.id FROM changed c JOIN was w ON w.id = c.id, number_forms(c.number_key) AS f
           WHERE w.number_key <> c.number_key;
         RETURN NULL;
       END $$`,
    );
    await q("DROP INDEX number_variants_variant");
    await q("ALTER TABLE number_variants DROP COLUMN number_key");
    await q("CREATE INDEX number_variants_variant ON number_variants (variant)");
  });
}
