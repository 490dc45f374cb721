import type { CreationAttributes, Transaction } from "sequelize";
import { Cross, Maker, OriginalPart, PartUsage, Proposal, sequelize, StandardPart } from "@/db";
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
    const crosses = await Cross.bulkCreate(
      plan.newCrosses.map((c) => ({
        originalPartId: ref(c.partRef),
        standardPartId: ref(c.standardRef),
        repairMethod: null,
        fit: c.fit as CreationAttributes<Cross>["fit"],
        notes: c.notes,
        status: "approved" as const,
        origin: "import" as const,
        createdBy: context.userId,
      })),
      { ...t, returning: true },
    );
    inserted(
      "crosses",
      plan.newCrosses.map((c) => c.line),
      crosses.map((c) => c.id),
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

/** New parts in one statement, then where they are used; later chunks see the parts under their real ids. */
async function writeParts(
  plan: ChunkPlan,
  context: WriteContext,
  real: Map<number, number>,
  ref: (id: number) => number,
  inserted: (table: string, lines: number[], ids: number[]) => void,
): Promise<void> {
  const t = { transaction: context.transaction };
  const parts = await OriginalPart.bulkCreate(
    plan.newParts.map((p) => ({
      ...(p.values as unknown as CreationAttributes<OriginalPart>),
      makerId: ref(p.makerRef),
    })),
    { ...t, returning: true },
  );
  parts.forEach((row, i) => {
    real.set(plan.newParts[i].placeholder, row.id);
    context.memory.parts.set(plan.newParts[i].key, row.id);
  });
  inserted(
    "original_parts",
    plan.newParts.map((p) => p.line),
    parts.map((p) => p.id),
  );
  const used = plan.newParts.filter((p) => p.usage);
  const usages = await PartUsage.bulkCreate(
    used.map((p) => ({
      partId: ref(p.placeholder),
      ...p.usage!,
      quantity: 1,
      serialNote: null,
      position: String(p.values.description),
    })),
    { ...t, returning: true },
  );
  inserted(
    "part_usages",
    used.map((p) => p.line),
    usages.map((u) => u.id),
  );
}

async function recordChanges(changes: Change[], context: WriteContext): Promise<void> {
  if (changes.length === 0) return;
  await sequelize.getQueryInterface().bulkInsert(
    "import_changes",
    changes.map((c) => ({
      import_id: context.importId,
      line: c.line,
      table_name: c.table,
      record_id: c.id,
      action: c.action,
      before: c.before ? JSON.stringify(c.before) : null,
    })),
    { transaction: context.transaction },
  );
}
