import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Serial ranges, positions, word search and order details.
 *
 * - `part_usages.serial_from` / `serial_to`: the machine serials (inclusive, the running number after the machine's
 *   `serial_prefix`) a part was fitted from or to; null is open-ended. `position` names the place in the assembly the
 *   part fills ("Water pump bearing, front"): parts of one machine that share a position replace each other.
 * - `job_lists.machine_serial`: the serial of the machine the list is for, when the person knows it.
 * - `job_list_lines`: supplier, supplier's number, unit price and an "ordered" mark; `removed_at` keeps a removed
 *   line for a short while so that the removal can be undone.
 * - `original_parts.search_document`: the words a part is found by (its description, maker, assemblies and machine
 *   models), kept up to date by triggers whichever code writes the rows, with a GIN index for full-text search.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    const q = (sql: string) => qi.sequelize.query(sql, t);
    await qi.addColumn("machines", "serial_prefix", { type: DataTypes.STRING(12), allowNull: true }, t);
    await qi.addColumn("part_usages", "serial_from", { type: DataTypes.INTEGER, allowNull: true }, t);
    await qi.addColumn("part_usages", "serial_to", { type: DataTypes.INTEGER, allowNull: true }, t);
    await qi.addColumn("part_usages", "position", { type: DataTypes.STRING(200), allowNull: true }, t);
    await q(
      "ALTER TABLE part_usages ADD CONSTRAINT part_usages_serial_order CHECK " +
        "(serial_from IS NULL OR serial_to IS NULL OR serial_from <= serial_to)",
    );
    // Notes written before the columns existed ("Early machines, to serial 22-1340") give up their numbers.
    await q(`UPDATE part_usages SET serial_to = substring(serial_note from
      'to serial [^0-9]*(?:[0-9]+-)?([0-9]+)')::integer
             WHERE serial_note ~ 'to serial [^0-9]*([0-9]+-)?[0-9]+'`);
    await q(`UPDATE part_usages SET serial_from = substring(serial_note from
      'from serial [^0-9]*(?:[0-9]+-)?([0-9]+)')::integer
             WHERE serial_note ~ 'from serial [^0-9]*([0-9]+-)?[0-9]+'`);
    await q("UPDATE part_usages u SET position = p.description FROM original_parts p WHERE p.id = u.part_id");

    await qi.addColumn("job_lists", "machine_serial", { type: DataTypes.INTEGER, allowNull: true }, t);
    await qi.addColumn("job_list_lines", "supplier", { type: DataTypes.STRING(120), allowNull: true }, t);
    await qi.addColumn("job_list_lines", "supplier_number", { type: DataTypes.STRING(60), allowNull: true }, t);
    await qi.addColumn("job_list_lines", "unit_price", { type: DataTypes.DECIMAL(10, 2), allowNull: true }, t);
    await qi.addColumn(
      "job_list_lines",
      "ordered",
      { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      t,
    );
    await qi.addColumn("job_list_lines", "removed_at", { type: DataTypes.DATE, allowNull: true }, t);
    await q(
      "ALTER TABLE job_list_lines ADD CONSTRAINT job_list_lines_price CHECK (unit_price IS NULL OR unit_price >= 0)",
    );
    // A measured item may be removed and added again: the one-line rule holds among the lines still on the list.
    await q("DROP INDEX IF EXISTS job_list_lines_list_item");
    await q(
      `CREATE UNIQUE INDEX job_list_lines_list_item ON job_list_lines (list_id, (standard_item->>'kind'),
        upper(standard_item->>'designation'))
       WHERE part_id IS NULL AND removed_at IS NULL`,
    );

    // Prefix look-up ("CV-30" finds CV-3003-A) reads these with LIKE 'CV30%'.
    await q(
      "CREATE INDEX original_parts_number_normalized_prefix ON original_parts (number_normalized text_pattern_ops)",
    );
    await q("CREATE INDEX original_parts_number_key_prefix ON original_parts (number_key text_pattern_ops)");

    await qi.addColumn("original_parts", "search_document", { type: "tsvector", allowNull: true }, t);
    await q(`
      CREATE FUNCTION part_search_document(part_id integer, description text, maker_id integer) RETURNS tsvector
      LANGUAGE sql STABLE AS $$
        SELECT setweight(to_tsvector('english', coalesce(description, '')), 'A')
            || setweight(to_tsvector('english', coalesce((SELECT string_agg(DISTINCT a.name || ' ' || ma.model, ' ')
                 FROM part_usages u JOIN machines ma ON ma.id = u.machine_id JOIN assemblies a ON a.id = u.assembly_id
                 WHERE u.part_id = $1), '')), 'B')
            || setweight(to_tsvector('english', coalesce((SELECT name FROM makers WHERE id = $3), '')), 'C')
      $$`);
    await q(`
      CREATE FUNCTION original_parts_search_row() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        NEW.search_document := part_search_document(NEW.id, NEW.description, NEW.maker_id);
        RETURN NEW;
      END $$`);
    await q(`CREATE TRIGGER original_parts_search BEFORE INSERT OR UPDATE OF description, maker_id ON original_parts
             FOR EACH ROW EXECUTE FUNCTION original_parts_search_row()`);
    // Usages change the words of the parts they name; one statement may touch thousands (an import), so the parts are
    // refreshed once per statement from its transition tables.
    await q(`
      CREATE FUNCTION part_usages_search_refresh() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'INSERT' THEN
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id) WHERE
            p.id IN (SELECT part_id FROM new_rows);
        ELSIF TG_OP = 'DELETE' THEN
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id) WHERE
            p.id IN (SELECT part_id FROM old_rows);
        ELSE
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id)
          WHERE p.id IN (SELECT part_id FROM new_rows UNION SELECT part_id FROM old_rows);
        END IF;
        RETURN NULL;
      END $$`);
    await q(`CREATE TRIGGER part_usages_search_insert AFTER INSERT ON part_usages REFERENCING NEW TABLE AS new_rows
             FOR EACH STATEMENT EXECUTE FUNCTION part_usages_search_refresh()`);
    await q(`CREATE TRIGGER part_usages_search_delete AFTER DELETE ON part_usages REFERENCING OLD TABLE AS old_rows
             FOR EACH STATEMENT EXECUTE FUNCTION part_usages_search_refresh()`);
    await q(`CREATE TRIGGER part_usages_search_update AFTER UPDATE ON part_usages REFERENCING OLD TABLE AS old_rows NEW
      TABLE AS new_rows
             FOR EACH STATEMENT EXECUTE FUNCTION part_usages_search_refresh()`);
    // A renamed machine, place or maker changes the words of every part it holds (rare: an editor's correction).
    await q(`
      CREATE FUNCTION names_search_refresh() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_TABLE_NAME = 'makers' THEN
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id) WHERE
            p.maker_id = NEW.id;
        ELSIF TG_TABLE_NAME = 'machines' THEN
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id)
          WHERE p.id IN (SELECT part_id FROM part_usages WHERE machine_id = NEW.id);
        ELSE
          UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id)
          WHERE p.id IN (SELECT part_id FROM part_usages WHERE assembly_id = NEW.id);
        END IF;
        RETURN NULL;
      END $$`);
    await q(
      "CREATE TRIGGER makers_search AFTER UPDATE OF name ON makers FOR EACH " +
        "ROW WHEN (OLD.name IS DISTINCT FROM NEW.name) EXECUTE FUNCTION " +
        "names_search_refresh()",
    );
    await q(
      "CREATE TRIGGER machines_search AFTER UPDATE OF model ON machines FOR " +
        "EACH ROW WHEN (OLD.model IS DISTINCT FROM NEW.model) EXECUTE FUNCTION " +
        "names_search_refresh()",
    );
    await q(
      "CREATE TRIGGER assemblies_search AFTER UPDATE OF name ON assemblies " +
        "FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name) EXECUTE " +
        "FUNCTION names_search_refresh()",
    );
    await q("UPDATE original_parts p SET search_document = part_search_document(p.id, p.description, p.maker_id)");
    await q("CREATE INDEX original_parts_search ON original_parts USING gin (search_document)");
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    const q = (sql: string) => qi.sequelize.query(sql, t);
    await q("DROP TRIGGER IF EXISTS makers_search ON makers");
    await q("DROP TRIGGER IF EXISTS machines_search ON machines");
    await q("DROP TRIGGER IF EXISTS assemblies_search ON assemblies");
    await q("DROP TRIGGER IF EXISTS part_usages_search_insert ON part_usages");
    await q("DROP TRIGGER IF EXISTS part_usages_search_delete ON part_usages");
    await q("DROP TRIGGER IF EXISTS part_usages_search_update ON part_usages");
    await q("DROP TRIGGER IF EXISTS original_parts_search ON original_parts");
    await q("DROP FUNCTION IF EXISTS names_search_refresh()");
    await q("DROP FUNCTION IF EXISTS part_usages_search_refresh()");
    await q("DROP FUNCTION IF EXISTS original_parts_search_row()");
    await q("DROP FUNCTION IF EXISTS part_search_document(integer, text, integer)");
    await q("DROP INDEX IF EXISTS original_parts_search");
    await qi.removeColumn("original_parts", "search_document", t);
    await q("DROP INDEX IF EXISTS original_parts_number_normalized_prefix");
    await q("DROP INDEX IF EXISTS original_parts_number_key_prefix");
    await q("DELETE FROM job_list_lines WHERE removed_at IS NOT NULL");
    await q("DROP INDEX IF EXISTS job_list_lines_list_item");
    await q(
      `CREATE UNIQUE INDEX job_list_lines_list_item ON job_list_lines (list_id, (standard_item->>'kind'),
        upper(standard_item->>'designation'))
       WHERE part_id IS NULL`,
    );
    await q("ALTER TABLE job_list_lines DROP CONSTRAINT IF EXISTS job_list_lines_price");
    for (const column of ["supplier", "supplier_number", "unit_price", "ordered", "removed_at"])
      await qi.removeColumn("job_list_lines", column, t);
    await qi.removeColumn("job_lists", "machine_serial", t);
    await q("ALTER TABLE part_usages DROP CONSTRAINT IF EXISTS part_usages_serial_order");
    for (const column of ["serial_from", "serial_to", "position"]) await qi.removeColumn("part_usages", column, t);
    await qi.removeColumn("machines", "serial_prefix", t);
  });
}
