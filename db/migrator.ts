import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";
import { migrations } from "@/db/migrations";

export function createMigrator(sequelize: Sequelize, log: (message: string) => void = () => {}) {
  return new Umzug<QueryInterface>({
    migrations: migrations.map(({ name, up, down }) => ({
      name,
      up: ({ context }) => up({ context }),
      down: ({ context }) => down({ context }),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: {
      info: (event) => {
        const e = event as { event?: string; name?: string };
        if (e.event === "migrated" || e.event === "reverted") log(`${e.event} ${e.name}`);
      },
      warn: (event) => log(`warning: ${JSON.stringify(event)}`),
      error: (event) => log(`error: ${JSON.stringify(event)}`),
      debug: () => {},
    },
  });
}
