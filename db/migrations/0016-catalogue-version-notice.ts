import type { QueryInterface } from "sequelize";

/**
 * The catalogue's new version is announced when it is raised (NOTIFY catalogue_version, delivered at the commit), so
 * that each app server keeps it in memory (lib/http/cache.ts) instead of asking for it with every request.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query(
    `CREATE OR REPLACE FUNCTION raise_catalogue_version() RETURNS trigger LANGUAGE plpgsql AS $$
     DECLARE raised bigint;
     BEGIN
       UPDATE catalogue_version SET version = version + 1 WHERE id = 1 RETURNING version INTO raised;
       DELETE FROM catalogue_touches WHERE txid = NEW.txid;
       PERFORM pg_notify('catalogue_version', raised::text);
       RETURN NULL;
     END $$`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query(
    `CREATE OR REPLACE FUNCTION raise_catalogue_version() RETURNS trigger LANGUAGE plpgsql AS $$
     BEGIN
       UPDATE catalogue_version SET version = version + 1 WHERE id = 1;
       DELETE FROM catalogue_touches WHERE txid = NEW.txid;
       RETURN NULL;
     END $$`,
  );
}
