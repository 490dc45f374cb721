import { DataTypes, type QueryInterface } from "sequelize";

// Frozen copies of the lists in lib/imports/kinds.ts as they stood when this migration was written.
const IMPORT_STATUSES = ["uploaded", "parsing", "parsed", "committing", "committed", "failed", "rolled_back"] as const;
const IMPORT_TARGETS = ["catalogue", "review_queue"] as const;

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
const userRef = (allowNull: boolean) => ({
  type: DataTypes.STRING(40),
  allowNull,
  references: { model: "users", key: "id" },
  onDelete: allowNull ? "SET NULL" : "CASCADE",
});
const ref = (model: string, allowNull: boolean, onDelete: string) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model, key: "id" },
  onDelete,
});
const stamps = () => ({
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
});

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    // One uploaded spreadsheet: where the original is stored, how it was read, what a dry run found and what a
    // commit did. `progress` is written as the work goes, for the page's progress bar.
    await qi.createTable(
      "imports",
      {
        id: id(),
        user_id: userRef(true),
        target: { type: DataTypes.ENUM(...IMPORT_TARGETS), allowNull: false },
        status: { type: DataTypes.ENUM(...IMPORT_STATUSES), allowNull: false, defaultValue: "uploaded" },
        object_key: { type: DataTypes.STRING(200), allowNull: false },
        file_name: { type: DataTypes.STRING(200), allowNull: false },
        size_bytes: { type: DataTypes.BIGINT, allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        encoding: { type: DataTypes.STRING(20) },
        delimiter: { type: DataTypes.STRING(2) },
        headers: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        mapping: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        counts: { type: DataTypes.JSONB },
        committed_counts: { type: DataTypes.JSONB },
        progress: { type: DataTypes.JSONB },
        error_message: { type: DataTypes.TEXT },
        committed_at: { type: DataTypes.DATE },
        rolled_back_at: { type: DataTypes.DATE },
        ...stamps(),
      },
      t,
    );
    await qi.addIndex("imports", ["created_at"], t);
    await qi.createTable(
      "import_rejections",
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        import_id: ref("imports", false, "CASCADE"),
        line: { type: DataTypes.INTEGER, allowNull: false },
        column_name: { type: DataTypes.STRING(80) },
        reason: { type: DataTypes.TEXT, allowNull: false },
        raw: { type: DataTypes.JSONB, allowNull: false },
      },
      t,
    );
    await qi.addIndex("import_rejections", ["import_id", "line"], t);
    // Every row a commit wrote, with what was there before, so that the whole import can be rolled back.
    await qi.createTable(
      "import_changes",
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        import_id: ref("imports", false, "CASCADE"),
        line: { type: DataTypes.INTEGER, allowNull: false },
        table_name: { type: DataTypes.STRING(40), allowNull: false },
        record_id: { type: DataTypes.INTEGER, allowNull: false },
        action: { type: DataTypes.STRING(10), allowNull: false },
        before: { type: DataTypes.JSONB },
      },
      t,
    );
    await qi.addIndex("import_changes", ["import_id", "table_name"], t);
    await qi.createTable(
      "import_mappings",
      {
        id: id(),
        name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        mapping: { type: DataTypes.JSONB, allowNull: false },
        created_by: userRef(true),
        ...stamps(),
      },
      t,
    );

    // A shop's parts list for one job. Private to its owner; a share token gives read-only access by link.
    await qi.createTable(
      "job_lists",
      {
        id: id(),
        user_id: userRef(false),
        title: { type: DataTypes.STRING(120), allowNull: false },
        machine_id: ref("machines", true, "SET NULL"),
        notes: { type: DataTypes.TEXT },
        share_token: { type: DataTypes.STRING(64), unique: true },
        ...stamps(),
      },
      t,
    );
    await qi.addIndex("job_lists", ["user_id", "updated_at"], t);
    await qi.createTable(
      "job_list_lines",
      {
        id: id(),
        list_id: ref("job_lists", false, "CASCADE"),
        part_id: ref("original_parts", false, "CASCADE"),
        requested_number: { type: DataTypes.STRING(60) },
        standard_part_id: ref("standard_parts", true, "SET NULL"),
        quantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        notes: { type: DataTypes.TEXT },
        ...stamps(),
      },
      t,
    );
    await qi.addIndex("job_list_lines", ["list_id", "part_id"], { unique: true, ...t });
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    for (const table of [
      "job_list_lines",
      "job_lists",
      "import_mappings",
      "import_changes",
      "import_rejections",
      "imports",
    ])
      await qi.dropTable(table, t);
    for (const type of ["enum_imports_status", "enum_imports_target"])
      await qi.sequelize.query(`DROP TYPE IF EXISTS "${type}"`, t);
  });
}
