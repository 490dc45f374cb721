import { QueryTypes } from "sequelize";
import { sequelize } from "@/db";

/**
 * A synthetic catalogue for benchmarks: `parts` original parts of an invented maker ("Synthetic Works", numbers
 * SY-000001-A …) with four crosses each, built by PostgreSQL itself (generate_series) in one transaction.
 * Sizes come from real standard parts already in the database, so size searches find them.
 */
export async function seedLargeCatalogue(parts: number, log: (message: string) => void = () => {}): Promise<void> {
  const started = Date.now();
  await sequelize.transaction(async (transaction) => {
    const q = (sql: string, replacements: Record<string, unknown> = {}) =>
      sequelize.query(sql, { replacements, transaction, type: QueryTypes.RAW });
    const existing = await sequelize.query<{ id: number }>("SELECT id FROM makers WHERE name = 'Synthetic Works'", {
      transaction,
      type: QueryTypes.SELECT,
    });
    if (existing.length > 0)
      throw new Error("The synthetic catalogue is already loaded; start from an empty database to load it again.");
    await q(`INSERT INTO makers (name, prefixes, country, note, created_at, updated_at)
             VALUES ('Synthetic Works', ARRAY['SY'], 'invented (benchmarks)', 'Generated for benchmarks only.', now(),
               now())`);
    await q(`INSERT INTO machines (maker_id, model, kind, year_from, year_to, created_at, updated_at)
             SELECT (SELECT id FROM makers WHERE name = 'Synthetic Works'), 'Synthetic ' || g, 'tractor', 1930 + g %
               30, 1940 + g % 30, now(), now()
             FROM generate_series(1, 100) g`);
    await q(
      `INSERT INTO assemblies (name, caution, created_at, updated_at) VALUES ` +
        `('Synthetic assembly', NULL, now(), now()) ON CONFLICT (name) DO ` +
        `NOTHING`,
    );
    await q(
      "CREATE TEMP TABLE sizes ON COMMIT DROP AS SELECT row_number() OVER " +
        "(ORDER BY id) - 1 AS i, id, inner_mm, outer_mm, width_mm FROM " +
        "standard_parts WHERE kind = 'bearing'",
    );
    await q(
      "CREATE TEMP TABLE targets ON COMMIT DROP AS SELECT row_number() OVER " +
        "(ORDER BY id) - 1 AS i, id FROM standard_parts",
    );
    await q("CREATE INDEX ON targets (i)");
    log(`inserting ${parts} parts…`);
    await q(
      `INSERT INTO original_parts (maker_id, number, number_normalised, number_key, description, category, inner_mm,
        outer_mm, width_mm, created_at, updated_at)
       SELECT m.id, 'SY-' || lpad(g::text, 6, '0') || '-' || chr(65 + g % 5),
              lpad(g::text, 6, '0') || chr(65 + g % 5),
              translate(lpad(g::text, 6, '0') || chr(65 + g % 5), 'OQILSBZG', '00115826'),
              'Synthetic part ' || g, 'bearing', s.inner_mm, s.outer_mm, s.width_mm, now(), now()
       FROM generate_series(1, :parts) g
       CROSS JOIN (SELECT id FROM makers WHERE name = 'Synthetic Works') m
       JOIN sizes s ON s.i = g % (SELECT count(*) FROM sizes)`,
      { parts },
    );
    log("inserting where-used and crosses…");
    await q(`INSERT INTO part_usages (part_id, machine_id, assembly_id, quantity, position, created_at, updated_at)
             SELECT p.id, ma.id, (SELECT id FROM assemblies WHERE name = 'Synthetic assembly'), 1, p.description,
               now(), now()
             FROM original_parts p JOIN makers mk ON mk.id = p.maker_id AND mk.name = 'Synthetic Works'
             JOIN machines ma ON ma.maker_id = mk.id AND ma.model = 'Synthetic ' || (1 + p.id % 100)`);
    await q(`INSERT INTO crosses (original_part_id, standard_part_id, fit, status, origin, created_at, updated_at)
             SELECT p.id, t.id,
                    (ARRAY['direct', 'with_modification', 'dimensions_only', 'direct'])[k]::enum_crosses_fit,
                    CASE WHEN (p.id + k) % 10 = 0 THEN 'pending' ELSE 'approved' END::enum_crosses_status, 'import',
                      now(), now()
             FROM original_parts p JOIN makers mk ON mk.id = p.maker_id AND mk.name = 'Synthetic Works'
             CROSS JOIN generate_series(1, 4) k
             JOIN targets t ON t.i = (p.id * k) % (SELECT count(*) FROM targets)
             ON CONFLICT DO NOTHING`); // a part may draw one standard part twice; one approved cross of each is kept
  });
  await sequelize.query("ANALYZE");
  log(`synthetic catalogue loaded in ${Math.round((Date.now() - started) / 1000)} s`);
}
