import type pg from "pg";
import { DatabaseError } from "sequelize";
import { sequelize } from "@/db/sequelize";

/**
 * A statement of the hottest reads, prepared once on each pooled connection and then run by name with bound
 * parameters: one round trip, no parse or plan text sent again, and no model layer in between. The connection comes
 * from Sequelize's own pool, so reads go to a replica and a browser that has just written reads from the primary,
 * as with every other read (db/sequelize.ts).
 */
export interface PreparedStatement {
  /** Unique in the app: node-postgres prepares it under this name the first time a connection runs it. */
  name: string;
  text: string;
}

export async function runPrepared<Row extends object>(statement: PreparedStatement, values: unknown[]): Promise<Row[]> {
  // Sequelize's pool takes a query's type ("SELECT" may go to a replica), though its types name only read and write.
  const options = { type: "SELECT", useMaster: false } as unknown as { type: "read" };
  const connection = (await sequelize.connectionManager.getConnection(options)) as unknown as pg.Client;
  try {
    const result = await connection.query<Row>({ name: statement.name, text: statement.text, values });
    return result.rows;
  } catch (error) {
    // As Sequelize's own queries report theirs, so an outage here is told apart the same way (lib/http/handle.ts).
    throw new DatabaseError(Object.assign(error as Error, { sql: statement.text }));
  } finally {
    sequelize.connectionManager.releaseConnection(connection as never);
  }
}
