import { DataTypes, type QueryInterface } from "sequelize";

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "users",
      {
        id: { type: DataTypes.STRING(40), primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        password_hash: { type: DataTypes.TEXT, allowNull: false },
        role: { type: DataTypes.ENUM("member", "moderator", "admin"), allowNull: false, defaultValue: "member" },
        email_verified_at: { type: DataTypes.DATE, allowNull: true },
        notify_by_email: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.createTable(
      "sessions",
      {
        id: { type: DataTypes.STRING(64), primaryKey: true },
        user_id: {
          type: DataTypes.STRING(40),
          allowNull: false,
          references: { model: "users", key: "id" },
          onDelete: "CASCADE",
        },
        expires_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex("sessions", ["user_id"], { transaction });
    await qi.createTable(
      "account_tokens",
      {
        token_hash: { type: DataTypes.STRING(64), primaryKey: true },
        user_id: {
          type: DataTypes.STRING(40),
          allowNull: false,
          references: { model: "users", key: "id" },
          onDelete: "CASCADE",
        },
        purpose: { type: DataTypes.ENUM("verify_email", "reset_password"), allowNull: false },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex("account_tokens", ["user_id", "purpose"], { transaction });
    await qi.createTable(
      "sign_in_failures",
      {
        key: { type: DataTypes.STRING(300), primaryKey: true },
        failures: { type: DataTypes.INTEGER, allowNull: false },
        window_started_at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("sign_in_failures", { transaction });
    await qi.dropTable("account_tokens", { transaction });
    await qi.dropTable("sessions", { transaction });
    await qi.dropTable("users", { transaction });
    await qi.sequelize.query('DROP TYPE IF EXISTS "enum_account_tokens_purpose"', { transaction });
    await qi.sequelize.query('DROP TYPE IF EXISTS "enum_users_role"', { transaction });
  });
}
