import { DataTypes, type QueryInterface } from "sequelize";

// Frozen copies of the lists in lib/community/kinds.ts and lib/catalogue/kinds.ts as they stood when this was written.
const SUBMISSION_STATUSES = ["pending", "changes_requested", "approved", "rejected"] as const;
const FITS = ["direct", "with_modification", "dimensions_only"] as const;

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
const userRef = (allowNull: boolean) => ({
  type: DataTypes.STRING(40),
  allowNull,
  references: { model: "users", key: "id" },
  onDelete: allowNull ? "SET NULL" : "CASCADE",
});
const ref = (model: string, allowNull: boolean, onDelete = allowNull ? "SET NULL" : "CASCADE") => ({
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
    // A member's proposal of a cross. It reaches the catalogue (as an approved cross) only through a moderator's
    // decision; `version` makes that decision a conditional update that only one moderator can win.
    await qi.createTable(
      "submissions",
      {
        id: id(),
        user_id: userRef(false),
        status: { type: DataTypes.ENUM(...SUBMISSION_STATUSES), allowNull: false, defaultValue: "pending" },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        original_part_id: ref("original_parts", true),
        new_part: { type: DataTypes.JSONB },
        standard_part_id: ref("standard_parts", true),
        new_standard: { type: DataTypes.JSONB },
        fit: { type: DataTypes.ENUM(...FITS), allowNull: false },
        measurements: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT },
        checks: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        moderator_message: { type: DataTypes.TEXT },
        decided_by: userRef(true),
        decided_at: { type: DataTypes.DATE },
        cross_id: ref("crosses", true),
        digest_sent_at: { type: DataTypes.DATE },
        ...stamps(),
      },
      t,
    );
    await qi.sequelize.query(
      "ALTER TABLE submissions ADD CONSTRAINT submissions_original CHECK " +
        "((original_part_id IS NOT NULL) OR (new_part IS NOT NULL))",
      t,
    );
    await qi.sequelize.query(
      "ALTER TABLE submissions ADD CONSTRAINT submissions_standard CHECK " +
        "((standard_part_id IS NOT NULL) OR (new_standard IS NOT NULL))",
      t,
    );
    await qi.addIndex("submissions", ["status", "created_at"], t);
    await qi.addIndex("submissions", ["user_id", "created_at"], t);
    await qi.addIndex("submissions", ["original_part_id"], t);
    // The part page finds an approved cross's photos through the proposal that made it.
    await qi.addIndex("submissions", ["cross_id"], t);

    // Photos are uploaded straight to storage before the submission is saved; a row is written when the upload is
    // granted, and tied to its submission when that is saved.
    await qi.createTable(
      "submission_photos",
      {
        id: id(),
        user_id: userRef(false),
        submission_id: ref("submissions", true, "CASCADE"),
        object_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        content_type: { type: DataTypes.STRING(60), allowNull: false },
        size_bytes: { type: DataTypes.INTEGER, allowNull: false },
        file_name: { type: DataTypes.STRING(200) },
        ...stamps(),
      },
      t,
    );
    await qi.addIndex("submission_photos", ["submission_id"], t);
    await qi.addIndex("submission_photos", ["user_id", "created_at"], t);

    // Who did what to which record, with the record before and after; read by admins.
    await qi.createTable(
      "audit_events",
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        actor_id: userRef(true),
        action: { type: DataTypes.STRING(60), allowNull: false },
        subject_type: { type: DataTypes.STRING(40), allowNull: false },
        subject_id: { type: DataTypes.STRING(40), allowNull: false },
        before: { type: DataTypes.JSONB },
        after: { type: DataTypes.JSONB },
        created_at: { type: DataTypes.DATE, allowNull: false },
      },
      t,
    );
    await qi.addIndex("audit_events", ["created_at"], t);
    await qi.addIndex("audit_events", ["subject_type", "subject_id"], t);

    // A member who fitted what another member proposed confirms the proposal; the confirmation moves to the cross
    // when the proposal is approved.
    await qi.addColumn("confirmations", "submission_id", ref("submissions", true, "CASCADE"), t);
    await qi.sequelize.query("ALTER TABLE confirmations ALTER COLUMN cross_id DROP NOT NULL", t);
    await qi.sequelize.query(
      "ALTER TABLE confirmations ADD CONSTRAINT confirmations_target CHECK " +
        "((cross_id IS NOT NULL) OR (submission_id IS NOT NULL))",
      t,
    );
    await qi.addIndex("confirmations", ["submission_id", "user_id"], { unique: true, ...t });
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.sequelize.query("DELETE FROM confirmations WHERE cross_id IS NULL", t);
    await qi.sequelize.query("ALTER TABLE confirmations DROP CONSTRAINT confirmations_target", t);
    await qi.removeColumn("confirmations", "submission_id", t);
    await qi.sequelize.query("ALTER TABLE confirmations ALTER COLUMN cross_id SET NOT NULL", t);
    for (const table of ["audit_events", "submission_photos", "submissions"]) await qi.dropTable(table, t);
    for (const type of ["enum_submissions_status", "enum_submissions_fit"]) {
      await qi.sequelize.query(`DROP TYPE IF EXISTS "${type}"`, t);
    }
  });
}
