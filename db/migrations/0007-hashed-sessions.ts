import type { QueryInterface } from "sequelize";

// Sessions at rest: the table keeps only a SHA-256 of each session token, so whoever reads it holds no live session.
// Sessions open when this runs keep working: their stored token is replaced by its hash, which is what the adapter
// now looks up. Going down cannot recover a token from its hash, so it signs everyone out.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query("UPDATE sessions SET id = encode(sha256(convert_to(id, 'UTF8')), 'hex')");
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query("DELETE FROM sessions");
}
