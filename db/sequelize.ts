import pg from "pg";
import { Sequelize } from "sequelize";
import { env } from "@/lib/env";
import { justWrote } from "@/lib/http/read-own-writes";

/** Set on every pooled connection, and on pgbench's when it runs the app's statements (npm run bench). */
export const PLAN_CACHE_MODE = "force_generic_plan";

/** A connection's settings from its URL, for Sequelize's replication entries. */
function connectionOf(url: string) {
  const u = new URL(url);
  return {
    host: u.hostname,
    port: Number(u.port || 5432),
    username: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: decodeURIComponent(u.pathname.slice(1)),
  };
}

export function createSequelize(
  databaseUrl: string,
  pool = { max: env.DB_POOL_MAX, acquire: env.DB_POOL_ACQUIRE_MS },
  readUrls: string[] = [],
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
    // Sequelize's own replication: reads outside a transaction go to a replica in turn; writes and everything in a
    // transaction go to the primary.
    ...(readUrls.length > 0
      ? { replication: { read: readUrls.map(connectionOf), write: connectionOf(databaseUrl) } }
      : {}),
    hooks: {
      // A browser that has just written reads from the primary for a few seconds (lib/http/read-own-writes.ts).
      ...(readUrls.length > 0
        ? {
            beforePoolAcquire: async (options: { type?: string; useMaster?: boolean } | undefined) => {
              if (options && options.type === "SELECT" && !options.useMaster && (await justWrote()))
                options.useMaster = true;
            },
          }
        : {}),
      // Look-up's similar-number search uses pg_trgm's % operator; its threshold is set once per pooled connection
      // rather than in a transaction around every search.
      afterConnect: async (connection) => {
        await (connection as pg.Client).query("SET pg_trgm.similarity_threshold = 0.3");
        // The statements the app prepares (db/prepared.ts) are written for one plan whatever their parameters (ranges,
        // not LIKE, for prefixes). Left to choose, PostgreSQL plans each run afresh, which costs more than the run.
        // Sequelize's own queries write their values into the text, or (inserts and updates by key) bind them to
        // statements whose one plan is the plan for any values.
        await (connection as pg.Client).query(`SET plan_cache_mode = ${PLAN_CACHE_MODE}`);
      },
    },
  });
}

const globalForDb = globalThis as unknown as { understudySequelize?: Sequelize };

/** The one shared connection pool; kept on globalThis so hot reloads in development reuse it. */
export const sequelize: Sequelize =
  globalForDb.understudySequelize ??
  createSequelize(env.DATABASE_URL, { max: env.DB_POOL_MAX, acquire: env.DB_POOL_ACQUIRE_MS }, env.DATABASE_READ_URLS);
globalForDb.understudySequelize = sequelize;
