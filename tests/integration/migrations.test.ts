import pg from "pg";
import { QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMigrator } from "@/db/migrator";
import { createSequelize } from "@/db/sequelize";

// A scratch database beside the test one, so that going down does not disturb the running app.
const base = new URL(process.env.DATABASE_URL ?? "");
const scratchName = `understudy_migrations_${process.pid}`;
const scratchUrl = new URL(base);
scratchUrl.pathname = `/${scratchName}`;

async function admin(sql: string): Promise<void> {
  const adminUrl = new URL(base);
  adminUrl.pathname = "/postgres";
  const client = new pg.Client({ connectionString: adminUrl.toString() });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

const sequelize = createSequelize(scratchUrl.toString());

beforeAll(() => admin(`CREATE DATABASE ${scratchName}`));
afterAll(async () => {
  await sequelize.close();
  await admin(`DROP DATABASE IF EXISTS ${scratchName}`);
});

async function tables(): Promise<string[]> {
  const rows = await sequelize.query<{ name: string }>(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = 'public' ORDER BY table_name",
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

async function enumTypes(): Promise<string[]> {
  const rows = await sequelize.query<{ name: string }>(
    "SELECT typname AS name FROM pg_type WHERE typtype = 'e' ORDER BY typname",
    {
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => r.name);
}

describe("migrations", () => {
  it("run up on an empty database and all the way down again, leaving nothing behind", async () => {
    const migrator = createMigrator(sequelize);
    await migrator.up();
    expect(await migrator.pending()).toEqual([]);
    expect(await tables()).toEqual(
      expect.arrayContaining(["users", "sessions", "account_tokens", "sign_in_failures", "schema_migrations"]),
    );

    await migrator.down({ to: 0 });
    expect(await migrator.executed()).toEqual([]);
    expect(await tables()).toEqual(["schema_migrations"]);
    expect(await enumTypes()).toEqual([]);

    await migrator.up();
    expect(await migrator.pending()).toEqual([]);
  });
});
