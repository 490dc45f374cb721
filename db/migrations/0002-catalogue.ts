import { DataTypes, type QueryInterface } from "sequelize";

// Frozen copies of the lists in lib/catalogue/kinds.ts as they stood when this migration was written.
const PART_CATEGORIES = ["bearing", "lip_seal", "felt_seal", "v_belt", "key", "gasket", "plug", "other"] as const;
const STANDARD_KINDS = ["bearing", "lip_seal", "v_belt", "key", "plug", "felt", "sleeve", "gasket_sheet"] as const;
const FITS = ["direct", "with_modification", "dimensions_only"] as const;
const CROSS_STATUSES = ["approved", "pending", "rejected"] as const;
const CROSS_ORIGINS = ["editor", "import", "community"] as const;
const SUPERSESSION_KINDS = ["interchangeable", "one_way", "with_companions"] as const;

const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true });
const ref = (model: string, allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model, key: "id" },
  onDelete: allowNull ? "SET NULL" : "CASCADE",
});
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
// A fresh object for each attribute: Sequelize writes the column name into the definition it is given.
const mm = () => ({ type: DataTypes.DOUBLE, allowNull: true });

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    // Trigram similarity for misread and mistyped factory numbers.
    await qi.sequelize.query("CREATE EXTENSION IF NOT EXISTS pg_trgm", t);
    await qi.createTable(
      "makers",
      {
        id: id(),
        name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
        prefixes: { type: DataTypes.ARRAY(DataTypes.STRING(12)), allowNull: false, defaultValue: [] },
        country: { type: DataTypes.STRING(60) },
        note: { type: DataTypes.TEXT },
        ...stamps,
      },
      t,
    );
    await qi.createTable(
      "machines",
      {
        id: id(),
        maker_id: ref("makers"),
        model: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.ENUM("tractor", "crawler", "engine"), allowNull: false },
        year_from: { type: DataTypes.INTEGER },
        year_to: { type: DataTypes.INTEGER },
        serial_note: { type: DataTypes.TEXT },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("machines", ["maker_id", "model"], { unique: true, ...t });
    await qi.createTable(
      "assemblies",
      {
        id: id(),
        name: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        caution: { type: DataTypes.STRING(20) },
        ...stamps,
      },
      t,
    );
    await qi.createTable(
      "original_parts",
      {
        id: id(),
        maker_id: ref("makers"),
        number: { type: DataTypes.STRING(60), allowNull: false },
        number_normalized: { type: DataTypes.STRING(60), allowNull: false },
        number_key: { type: DataTypes.STRING(60), allowNull: false },
        description: { type: DataTypes.STRING(200), allowNull: false },
        category: { type: DataTypes.ENUM(...PART_CATEGORIES), allowNull: false },
        inner_mm: mm(),
        outer_mm: mm(),
        width_mm: mm(),
        length_mm: mm(),
        dimensions_note: { type: DataTypes.STRING(200) },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("original_parts", ["maker_id", "number_normalized"], { unique: true, ...t });
    await qi.addIndex("original_parts", ["number_normalized"], t);
    await qi.addIndex("original_parts", ["number_key"], t);
    // GIN for the similarity operator (%). GiST would serve nearest-neighbour ordering too, but measured ten times
    // slower on short part numbers, which share many trigrams (docs/performance.md).
    await qi.sequelize.query(
      "CREATE INDEX original_parts_number_key_trgm ON original_parts USING gin (number_key gin_trgm_ops)",
      t,
    );
    // Measured-size search: a category and two diameters within a tolerance.
    await qi.addIndex("original_parts", ["category", "inner_mm", "outer_mm"], t);
    await qi.createTable(
      "part_usages",
      {
        id: id(),
        part_id: ref("original_parts"),
        machine_id: ref("machines"),
        assembly_id: ref("assemblies"),
        quantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        serial_note: { type: DataTypes.STRING(200) },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("part_usages", ["part_id"], t);
    await qi.addIndex("part_usages", ["machine_id", "assembly_id"], t);
    await qi.createTable(
      "supersessions",
      {
        id: id(),
        old_part_id: ref("original_parts"),
        new_part_id: ref("original_parts"),
        kind: { type: DataTypes.ENUM(...SUPERSESSION_KINDS), allowNull: false, defaultValue: "interchangeable" },
        note: { type: DataTypes.TEXT },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("supersessions", ["old_part_id", "new_part_id"], { unique: true, ...t });
    await qi.addIndex("supersessions", ["new_part_id"], t);
    await qi.createTable(
      "standard_parts",
      {
        id: id(),
        kind: { type: DataTypes.ENUM(...STANDARD_KINDS), allowNull: false },
        designation: { type: DataTypes.STRING(80), allowNull: false },
        inner_mm: mm(),
        outer_mm: mm(),
        width_mm: mm(),
        length_mm: mm(),
        attributes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("standard_parts", ["kind", "designation"], { unique: true, ...t });
    await qi.createTable(
      "crosses",
      {
        id: id(),
        original_part_id: ref("original_parts"),
        standard_part_id: ref("standard_parts", true),
        repair_method: { type: DataTypes.TEXT },
        fit: { type: DataTypes.ENUM(...FITS), allowNull: false },
        notes: { type: DataTypes.TEXT },
        status: { type: DataTypes.ENUM(...CROSS_STATUSES), allowNull: false, defaultValue: "pending" },
        origin: { type: DataTypes.ENUM(...CROSS_ORIGINS), allowNull: false },
        created_by: {
          type: DataTypes.STRING(40),
          allowNull: true,
          references: { model: "users", key: "id" },
          onDelete: "SET NULL",
        },
        ...stamps,
      },
      t,
    );
    await qi.sequelize.query(
      "ALTER TABLE crosses ADD CONSTRAINT crosses_target CHECK " +
        "((standard_part_id IS NOT NULL) OR (repair_method IS NOT NULL))",
      t,
    );
    await qi.addIndex("crosses", ["original_part_id", "status"], t);
    await qi.addIndex("crosses", ["standard_part_id"], t);
    await qi.createTable(
      "confirmations",
      {
        id: id(),
        cross_id: ref("crosses"),
        user_id: {
          type: DataTypes.STRING(40),
          allowNull: false,
          references: { model: "users", key: "id" },
          onDelete: "CASCADE",
        },
        note: { type: DataTypes.TEXT },
        ...stamps,
      },
      t,
    );
    await qi.addIndex("confirmations", ["cross_id", "user_id"], { unique: true, ...t });
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    for (const table of [
      "confirmations",
      "crosses",
      "standard_parts",
      "supersessions",
      "part_usages",
      "original_parts",
      "assemblies",
      "machines",
      "makers",
    ]) {
      await qi.dropTable(table, t);
    }
    for (const type of [
      "enum_crosses_status",
      "enum_crosses_origin",
      "enum_crosses_fit",
      "enum_standard_parts_kind",
      "enum_supersessions_kind",
      "enum_original_parts_category",
      "enum_machines_kind",
    ]) {
      await qi.sequelize.query(`DROP TYPE IF EXISTS "${type}"`, t);
    }
  });
}
