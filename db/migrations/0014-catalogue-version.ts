import type { QueryInterface } from "sequelize";

/**
 * The catalogue's version: one number that changes when a transaction that changed the catalogue commits, for the
 * ETags of its anonymous answers (lib/http/cache.ts). Each statement on a catalogue table notes its transaction in
 * `catalogue_touches` (one row at most per transaction); a trigger deferred to the commit then raises the version
 * once and removes the note. The version row is locked only for that moment at the commit, not for the whole of a
 * long import; and a reader never sees the new number before the data it stands for is visible.
 */
const CATALOGUE_TABLES = [
  "makers",
  "machines",
  "assemblies",
  "original_parts",
  "part_usages",
  "standard_parts",
  "crosses",
  "supersessions",
  "confirmations",
  "proposal_photos",
];

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    await q(`CREATE TABLE catalogue_version (id smallint PRIMARY KEY CHECK (id = 1), version bigint NOT NULL)`);
    await q(`INSERT INTO catalogue_version (id, version) VALUES (1, 1)`);
    await q(`CREATE TABLE catalogue_touches (txid bigint PRIMARY KEY)`);
    await q(
      `CREATE FUNCTION note_catalogue_touch() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         INSERT INTO catalogue_touches (txid) VALUES (txid_current()) ON CONFLICT DO NOTHING;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE FUNCTION raise_catalogue_version() RETURNS trigger LANGUAGE plpgsql AS $$
       BEGIN
         UPDATE catalogue_version SET version = version + 1 WHERE id = 1;
         DELETE FROM catalogue_touches WHERE txid = NEW.txid;
         RETURN NULL;
       END $$`,
    );
    await q(
      `CREATE CONSTRAINT TRIGGER raise_version_at_commit AFTER INSERT ON catalogue_touches
       DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION raise_catalogue_version()`,
    );
    for (const table of CATALOGUE_TABLES) {
      await q(
        `CREATE TRIGGER ${table}_touch_catalogue AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON ${table}
         FOR EACH STATEMENT EXECUTE FUNCTION note_catalogue_touch()`,
      );
    }
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const q = (sql: string) => qi.sequelize.query(sql, { transaction });
    for (const table of CATALOGUE_TABLES) await q(`DROP TRIGGER ${table}_touch_catalogue ON ${table}`);
    await q(`DROP TABLE catalogue_touches`);
    await q(`DROP FUNCTION raise_catalogue_version()`);
    await q(`DROP FUNCTION note_catalogue_touch()`);
    await q(`DROP TABLE catalogue_version`);
  });
}
