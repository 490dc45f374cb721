import type { QueryInterface } from "sequelize";

/**
 * Similar numbers found by equality: each part's look-alike key and every form of it with one character left out,
 * in a side table with a btree on the form. A typed number's own forms (itself and each one-character-short form)
 * then meet every stored number one edit away (a character missing, extra or different, or two swapped) in a
 * handful of index probes, however large the catalogue (lib/catalogue/find-parts.ts). The forms are kept by one
 * trigger per statement, so a COPY of 100,000 parts writes them in one pass.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(
      `CREATE FUNCTION number_forms(key text) RETURNS SETOF text LANGUAGE sql IMMUTABLE AS $$
         SELECT key UNION SELECT left(key, i - 1) || substr(key, i + 1) FROM generate_series(1, length(key)) AS i
       $$`,
    );
    await q(
      `CREATE TABLE number_variants (
         variant text NOT NULL,
         part_id integer NOT NULL REFERENCES original_parts (id) ON DELETE CASCADE
       )`,
    );
    await q(
      `INSERT INTO number_variants (variant, part_id)
       SELECT f, p.id FROM original_parts p, number_forms(p.number_key) AS f`,
    );
    await q("CREATE INDEX number_variants_variant ON number_variants (variant)");
    await q("CREATE INDEX number_variants_part ON number_variants (part_id)");
    await q(
      `CREATE FUNCTION add_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         INSERT INTO number_variants (variant, part_id) SELECT f, a.id FROM added a, number_forms(a.number_key) AS f;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE FUNCTION renew_number_variants() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         DELETE FROM number_variants v USING changed c JOIN was w ON w.id = c.id
           WHERE v.part_id = c.id AND w.number_key <> c.number_key;
         INSERT INTO number_variants (variant, part_id)
           SELECT f, c.id FROM changed c JOIN was w ON w.id = c.id, number_forms(c.number_key) AS f
           WHERE w.number_key <> c.number_key;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE TRIGGER original_parts_add_variants AFTER INSERT ON original_parts
       REFERENCING NEW TABLE AS added FOR EACH STATEMENT EXECUTE FUNCTION add_number_variants()`,
    );
    await q(
      `CREATE TRIGGER original_parts_renew_variants AFTER UPDATE ON original_parts
       REFERENCING OLD TABLE AS was NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION renew_number_variants()`,
    );
    await q("ANALYZE number_variants");
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q("DROP TRIGGER original_parts_renew_variants ON original_parts");
    await q("DROP TRIGGER original_parts_add_variants ON original_parts");
    await q("DROP FUNCTION renew_number_variants()");
    await q("DROP FUNCTION add_number_variants()");
    await q("DROP TABLE number_variants");
    await q("DROP FUNCTION number_forms(text)");
  });
}
