import pg from "pg";
import { Sequelize } from "sequelize";
import { env } from "@/lib/env";

export function createSequelize(
  databaseUrl: string,
  pool = { max: env.DB_POOL_MAX, acquire: env.DB_POOL_ACQUIRE_MS },
): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: "postgres",
    // Handing pg over explicitly keeps bundlers from having to resolve Sequelize's dynamic require.
    dialectModule: pg,
    logging: false,
    // A request holds at most one pooled connection at a time: work inside a transaction passes the transaction on,
    // or a dozen concurrent requests each holding one and waiting for another would exhaust the pool.
    pool: { max: pool.max, min: 0, idle: 10_000, acquire: pool.acquire },
    define: { underscored: true },
    hooks: {
      // Look-up's similar-number search uses pg_trgm's % operator; its threshold is set once per pooled connection
      // rather than in a transaction around every search.
      afterConnect: async (connection) => {
        await (connection as pg.Client).query("SET pg_trgm.similarity_threshold = 0.3");
      },
    },
  });
}

const globalForDb = globalThis as unknown as { understudySequelize?: Sequelize };

/** The one shared connection pool; kept on globalThis so hot reloads in development reuse it. */
export const sequelize: Sequelize = globalForDb.understudySequelize ?? createSequelize(env.DATABASE_URL);
globalForDb.understudySequelize = sequelize;
