import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type pg from "pg";
import { from as copyFrom } from "pg-copy-streams";
import { QueryTypes, type CreationAttributes, type Transaction } from "sequelize";
import { Cross, Maker, OriginalPart, Proposal, sequelize, StandardPart } from "@/db";
import type { CatalogueNames } from "@/lib/imports/classify";
import type { ChunkPlan, PlanMemory } from "@/lib/imports/plan";

/**
 * Step 5 of the pass, for a commit only: one chunk's plan written inside the commit's transaction, in the order the
 * records depend on each other (makers, standard parts, parts and where they are used, updates, crosses, proposals),
 * each placeholder replaced by the id the database gave, and every record written noted for a later rollback.
 */
export interface ChunkWriter {
  write(plan: ChunkPlan, context: WriteContext): Promise<void>;
}

export interface WriteContext {
  importId: number;
  userId: string | null;
  transaction: Transaction;
  memory: PlanMemory;
  names: CatalogueNames;
}

interface Change {
  line: number;
  table: string;
  id: number;
  action: "insert" | "update";
  before: Record<string, unknown> | null;
}

/** The writer a commit uses unless it is given another (a test wraps it to fail part-way). */
export const catalogueWriter: ChunkWriter = {
  async write(plan, context) {
    const t = { transaction: context.transaction };
    const changes: Change[] = [];
    const real = new Map<number, number>();
    const ref = (id: number) => (id < 0 ? real.get(id)! : id);
    const inserted = (table: string, lines: number[], ids: number[]) =>
      ids.forEach((id, i) => changes.push({ line: lines[i], table, id, action: "insert", before: null }));

    await writeMakersAndStandards(plan, context, real, inserted);
    await writeParts(plan, context, real, ref, inserted);
    for (const u of plan.partUpdates) {
      await OriginalPart.update(u.diff, { where: { id: u.id }, ...t });
      changes.push({ line: u.line, table: "original_parts", id: u.id, action: "update", before: u.before });
    }
    for (const u of plan.crossUpdates) {
      await Cross.update(u.diff, { where: { id: u.id }, ...t });
      changes.push({ line: u.line, table: "crosses", id: u.id, action: "update", before: u.before });
    }
    const crossIds = await takeIds(context.transaction, "crosses_id_seq", plan.newCrosses.length);
    const now = new Date().toISOString();
    await copyRows(
      context.transaction,
      "crosses",
      ["id", "original_part_id", "standard_part_id", "fit", "notes", "status", "origin", "created_by"],
      plan.newCrosses.map((c, i) => [
        crossIds[i],
        ref(c.partRef),
        ref(c.standardRef),
        c.fit,
        c.notes,
        "approved",
        "import",
        context.userId,
      ]),
      now,
    );
    inserted(
      "crosses",
      plan.newCrosses.map((c) => c.line),
      crossIds,
    );
    const proposals = await Proposal.bulkCreate(
      plan.newProposals.map((p) => ({
        ...(p.values as unknown as CreationAttributes<Proposal>),
        originalPartId: p.partRef === null ? null : ref(p.partRef),
        standardPartId: p.standardRef === null ? null : ref(p.standardRef),
      })),
      { ...t, returning: true },
    );
    inserted(
      "proposals",
      plan.newProposals.map((p) => p.line),
      proposals.map((p) => p.id),
    );
    await recordChanges(changes, context);
  },
};

/** New makers and standard parts first: the parts and crosses of the chunk name them. */
async function writeMakersAndStandards(
  plan: ChunkPlan,
  context: WriteContext,
  real: Map<number, number>,
  inserted: (table: string, lines: number[], ids: number[]) => void,
): Promise<void> {
  const t = { transaction: context.transaction };
  const makers = await Maker.bulkCreate(
    plan.newMakers.map((m) => ({ name: m.name, prefixes: [], country: null, note: null })),
    { ...t, returning: true },
  );
  makers.forEach((row, i) => {
    const planned = plan.newMakers[i];
    real.set(planned.placeholder, row.id);
    context.memory.makers.set(planned.key, row.id);
    context.names.makers.set(planned.key, { id: row.id, name: row.name, prefixes: [] });
  });
  inserted(
    "makers",
    plan.newMakers.map((m) => m.line),
    makers.map((m) => m.id),
  );
  const standards = await StandardPart.bulkCreate(
    plan.newStandards.map(({ values: s }) => ({
      kind: s.kind,
      designation: s.designation,
      innerMm: s.innerMm,
      outerMm: s.outerMm,
      widthMm: s.widthMm,
      lengthMm: s.lengthMm,
      attributes: s.attributes,
    })),
    { ...t, returning: true },
  );
  standards.forEach((row, i) => {
    real.set(plan.newStandards[i].placeholder, row.id);
    context.memory.standards.set(plan.newStandards[i].key, row.id);
  });
  inserted(
    "standard_parts",
    plan.newStandards.map((s) => s.line),
    standards.map((s) => s.id),
  );
}

/** New parts with one COPY, then where they are used; later chunks see the parts under their real ids. */
async function writeParts(
  plan: ChunkPlan,
  context: WriteContext,
  real: Map<number, number>,
  ref: (id: number) => number,
  inserted: (table: string, lines: number[], ids: number[]) => void,
): Promise<void> {
  const partIds = await takeIds(context.transaction, "original_parts_id_seq", plan.newParts.length);
  const now = new Date().toISOString();
  await copyRows(
    context.transaction,
    "original_parts",
    [
      "id",
      "maker_id",
      "number",
      "number_normalised",
      "number_key",
      "description",
      "category",
      "inner_mm",
      "outer_mm",
      "width_mm",
      "length_mm",
      "dimensions_note",
    ],
    plan.newParts.map(({ values: v, makerRef }, i) => [
      partIds[i],
      ref(makerRef),
      v.number,
      v.numberNormalised,
      v.numberKey,
      v.description,
      v.category,
      v.innerMm,
      v.outerMm,
      v.widthMm,
      v.lengthMm,
      v.dimensionsNote,
    ]),
    now,
  );
  plan.newParts.forEach((planned, i) => {
    real.set(planned.placeholder, partIds[i]);
    context.memory.parts.set(planned.key, partIds[i]);
  });
  inserted(
    "original_parts",
    plan.newParts.map((p) => p.line),
    partIds,
  );
  const used = plan.newParts.filter((p) => p.usage);
  const usageIds = await takeIds(context.transaction, "part_usages_id_seq", used.length);
  await copyRows(
    context.transaction,
    "part_usages",
    ["id", "part_id", "machine_id", "assembly_id", "quantity", "serial_note", "position"],
    used.map((p, i) => [
      usageIds[i],
      ref(p.placeholder),
      p.usage!.machineId,
      p.usage!.assemblyId,
      1,
      null,
      String(p.values.description),
    ]),
    now,
  );
  inserted(
    "part_usages",
    used.map((p) => p.line),
    usageIds,
  );
}

/**
 * Ids for `count` new rows of a table, taken from its sequence in one statement, so that rows loaded by COPY are
 * known by id at once (for the rows that name them, and the change log).
 */
export async function takeIds(transaction: Transaction, sequence: string, count: number): Promise<number[]> {
  if (count === 0) return [];
  const rows = await sequelize.query<{ id: number }>(
    `SELECT nextval('${sequence}')::int AS id FROM generate_series(1, :count)`,
    { replacements: { count }, transaction, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.id);
}

/** One value in COPY's text format: \N for null, and backslash, tab and line breaks escaped. */
function copyValue(value: unknown): string {
  if (value === null || value === undefined) return "\\N";
  const text = typeof value === "object" ? JSON.stringify(value) : String(value);
  return text.replace(/\\/g, "\\\\").replace(/\t/g, "\\t").replace(/\n/g, "\\n").replace(/\r/g, "\\r");
}

/** Lines of COPY text in blocks of about 64 KB, so that the stream is not written a row at a time. */
function* copyBlocks(rows: unknown[][], stamp: string | null): Generator<string> {
  let block = "";
  for (const row of rows) {
    const values = stamp === null ? row : [...row, stamp, stamp];
    block += `${values.map(copyValue).join("\t")}\n`;
    if (block.length > 65_536) {
      yield block;
      block = "";
    }
  }
  if (block) yield block;
}

/**
 * Rows loaded with PostgreSQL's COPY (pg-copy-streams) on the commit's own connection, so inside its transaction:
 * the constraints and triggers of the table apply as to an INSERT. `stamp` fills created_at and updated_at.
 */
export async function copyRows(
  transaction: Transaction,
  table: string,
  columns: string[],
  rows: unknown[][],
  stamp: string | null,
): Promise<void> {
  if (rows.length === 0) return;
  const client = (transaction as unknown as { connection: pg.PoolClient }).connection;
  const all = stamp === null ? columns : [...columns, "created_at", "updated_at"];
  const sink = client.query(copyFrom(`COPY ${table} (${all.join(", ")}) FROM STDIN`));
  await pipeline(Readable.from(copyBlocks(rows, stamp)), sink);
}

async function recordChanges(changes: Change[], context: WriteContext): Promise<void> {
  await copyRows(
    context.transaction,
    "import_changes",
    ["import_id", "line", "table_name", "record_id", "action", "before"],
    changes.map((c) => [context.importId, c.line, c.table, c.id, c.action, c.before]),
    null,
  );
}
