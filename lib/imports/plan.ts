import { STANDARD_KIND_NAMES, type PartCategory } from "@/lib/catalogue/kinds";
import type { AcceptedRow, Rejection } from "@/lib/imports/classify";
import { NAMES_KEPT, type ImportCounts, type ImportMappingValue, type ImportTarget } from "@/lib/imports/kinds";
import type { ParsedRow } from "@/lib/imports/rows";
import type { Measurement } from "@/lib/proposals/kinds";

/**
 * Step 4 of the pass, pure: what each accepted row would do to the catalogue as it stands (known to this step as
 * plain objects), as a plan of inserts and updates. Records the file itself adds are named by placeholders (negative
 * numbers) until the writer gives them ids. The dry run counts the plan; the commit writes it.
 */

export interface KnownPart {
  id: number;
  maker_id: number;
  number_normalised: string;
  description: string;
  category: PartCategory;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
}

export interface KnownCross {
  id: number;
  original_part_id: number;
  standard_part_id: number;
  fit: string;
  notes: string | null;
  status: string;
}

/** The catalogue's records for one chunk's rows, read in three queries. */
export interface KnownState {
  partByKey: Map<string, KnownPart>;
  standardByKey: Map<string, number>;
  crossByPair: Map<string, KnownCross>;
}

/** What the plan remembers across chunks: what earlier rows add, so later rows use it and count it once. */
export interface PlanMemory {
  makers: Map<string, number>;
  parts: Map<string, number>;
  standards: Map<string, number>;
  nextPlaceholder: number;
}

type Update = { line: number; id: number; diff: Record<string, unknown>; before: Record<string, unknown> };

export interface ChunkPlan {
  counts: ImportCounts;
  rejections: Rejection[];
  newMakers: Array<{ placeholder: number; key: string; name: string; line: number }>;
  newStandards: Array<{ placeholder: number; key: string; line: number; values: ParsedRow["standard"] }>;
  newParts: Array<{
    placeholder: number;
    key: string;
    line: number;
    makerRef: number;
    values: Record<string, unknown>;
    usage: { machineId: number; assemblyId: number } | null;
  }>;
  partUpdates: Update[];
  crossUpdates: Update[];
  newCrosses: Array<{ line: number; partRef: number; standardRef: number; fit: string; notes: string | null }>;
  newProposals: Array<{
    line: number;
    partRef: number | null;
    standardRef: number | null;
    values: Record<string, unknown>;
  }>;
}

const SAME = 0.001;

export const CATEGORY_FOR_KIND: Partial<Record<string, PartCategory>> = {
  bearing: "bearing",
  lip_seal: "lip_seal",
  v_belt: "v_belt",
  key: "key",
  plug: "plug",
  felt: "felt_seal",
  gasket_sheet: "gasket",
  packing: "packing",
  gasket: "gasket",
  pin: "pin",
  thread: "fastener",
  grease_fitting: "grease_fitting",
  chain: "chain",
};

export const emptyCounts = (): ImportCounts => ({
  rows: 0,
  newParts: 0,
  newCrosses: 0,
  updates: 0,
  unchanged: 0,
  rejected: 0,
  newMakers: 0,
  newStandardParts: 0,
  newMakerNames: [],
  newStandardPartNames: [],
});

/** A name for the summary, once, up to NAMES_KEPT of them. */
export const keepName = (names: string[] | undefined, name: string) => {
  if (names && names.length < NAMES_KEPT && !names.includes(name)) names.push(name);
};

interface PlanContext {
  target: ImportTarget;
  userId: string | null;
  mapping: ImportMappingValue;
  known: KnownState;
  memory: PlanMemory;
  plan: ChunkPlan;
}

export function planChunk(
  accepted: AcceptedRow[],
  options: {
    target: ImportTarget;
    userId: string | null;
    mapping: ImportMappingValue;
    known: KnownState;
    memory: PlanMemory;
  },
): ChunkPlan {
  const plan: ChunkPlan = {
    counts: emptyCounts(),
    rejections: [],
    newMakers: [],
    newStandards: [],
    newParts: [],
    partUpdates: [],
    crossUpdates: [],
    newCrosses: [],
    newProposals: [],
  };
  const context: PlanContext = { ...options, plan };
  for (const a of accepted) planRow(a, context);
  return plan;
}

function planRow(a: AcceptedRow, context: PlanContext): void {
  const { plan, known, target } = context;
  const existing = a.maker ? known.partByKey.get(`${a.maker.id}|${a.normalised}`) : undefined;
  const part = existing ? { id: existing.id, changed: planPartUpdate(a, existing, context) } : planNewPart(a, context);
  if (part === null) return;
  const standardId = planStandard(a, context);
  const cross =
    part.id !== undefined && standardId !== undefined ? known.crossByPair.get(`${part.id}|${standardId}`) : undefined;
  if (target === "review_queue") return planProposal(a, part.id, standardId, cross, context);
  if (cross) return planCrossUpdate(a, cross, part.changed, plan);
  plan.counts.newCrosses += 1;
  plan.newCrosses.push({
    line: a.line,
    partRef: part.id!,
    standardRef: standardId!,
    fit: a.row.fit,
    notes: a.row.notes,
  });
}

/** Changed description, kind or sizes of a part the catalogue has: an update (catalogue imports only). */
function planPartUpdate(a: AcceptedRow, existing: KnownPart, { target, plan }: PlanContext): boolean {
  const { row } = a;
  const diff: Record<string, unknown> = {};
  if (row.description && row.description !== existing.description) diff.description = row.description;
  if (row.category && row.category !== existing.category) diff.category = row.category;
  for (const [field, column] of [
    ["innerMm", "inner_mm"],
    ["outerMm", "outer_mm"],
    ["widthMm", "width_mm"],
    ["lengthMm", "length_mm"],
  ] as const) {
    const given = row[field];
    if (given !== null && (existing[column] === null || Math.abs(existing[column]! - given) > SAME))
      diff[field] = given;
  }
  if (Object.keys(diff).length === 0 || target !== "catalogue") return false;
  const before = {
    description: existing.description,
    category: existing.category,
    innerMm: existing.inner_mm,
    outerMm: existing.outer_mm,
    widthMm: existing.width_mm,
    lengthMm: existing.length_mm,
  };
  plan.partUpdates.push({ line: a.line, id: existing.id, diff, before });
  // Later rows of the file compare against the part as this row leaves it.
  Object.assign(existing, {
    description: diff.description ?? existing.description,
    category: diff.category ?? existing.category,
  });
  return true;
}

/**
 * A part the catalogue does not have: added (catalogue imports), or named in the proposal (review queue). Null when
 * the row lacks what a new part needs; it is rejected.
 */
function planNewPart(a: AcceptedRow, context: PlanContext): { id: number | undefined; changed: boolean } | null {
  const { plan, memory, mapping, target } = context;
  const key = `${a.makerKey}|${a.normalised}`;
  if (memory.parts.has(key)) return { id: memory.parts.get(key), changed: false };
  const category = a.row.category ?? CATEGORY_FOR_KIND[a.row.standard.kind] ?? null;
  if (!a.row.description) {
    const reason = "The part is new to the catalogue, so it needs a description.";
    plan.rejections.push({ line: a.line, raw: a.raw, column: mapping.description ?? null, reason });
    return null;
  }
  if (!category) {
    const reason = "The part is new to the catalogue, so it needs its kind (category).";
    plan.rejections.push({ line: a.line, raw: a.raw, column: mapping.category ?? null, reason });
    return null;
  }
  if (target !== "catalogue") return { id: undefined, changed: false };
  const placeholder = memory.nextPlaceholder--;
  memory.parts.set(key, placeholder);
  plan.counts.newParts += 1;
  plan.newParts.push({
    placeholder,
    key,
    line: a.line,
    makerRef: a.maker?.id ?? planMaker(a, context),
    values: {
      number: a.row.number.toUpperCase(),
      numberNormalised: a.normalised,
      numberKey: a.numberKey,
      description: a.row.description,
      category,
      innerMm: a.row.innerMm,
      outerMm: a.row.outerMm,
      widthMm: a.row.widthMm,
      lengthMm: a.row.lengthMm,
      dimensionsNote: null,
    },
    usage: a.machineId && a.assemblyId ? { machineId: a.machineId, assemblyId: a.assemblyId } : null,
  });
  return { id: placeholder, changed: false };
}

/** A maker the file names that the catalogue lacks, added once however many rows name it. */
function planMaker(a: AcceptedRow, { memory, plan }: PlanContext): number {
  const planned = memory.makers.get(a.makerKey);
  if (planned !== undefined) return planned;
  const placeholder = memory.nextPlaceholder--;
  memory.makers.set(a.makerKey, placeholder);
  plan.counts.newMakers += 1;
  keepName(plan.counts.newMakerNames, a.row.maker);
  plan.newMakers.push({ placeholder, key: a.makerKey, name: a.row.maker, line: a.line });
  return placeholder;
}

/** The standard part's id, or a placeholder for one the file adds (catalogue imports); undefined for a proposal's. */
function planStandard(a: AcceptedRow, { known, memory, plan, target }: PlanContext): number | undefined {
  const key = `${a.row.standard.kind}|${a.row.standard.designation.toUpperCase()}`;
  const id = known.standardByKey.get(key) ?? memory.standards.get(key);
  if (id !== undefined || target !== "catalogue") return id;
  const placeholder = memory.nextPlaceholder--;
  memory.standards.set(key, placeholder);
  plan.counts.newStandardParts += 1;
  keepName(
    plan.counts.newStandardPartNames,
    `${STANDARD_KIND_NAMES[a.row.standard.kind]} ${a.row.standard.designation}`,
  );
  plan.newStandards.push({ placeholder, key, line: a.line, values: a.row.standard });
  return placeholder;
}

function planCrossUpdate(a: AcceptedRow, cross: KnownCross, partChanged: boolean, plan: ChunkPlan): void {
  const diff: Record<string, unknown> = {};
  if (a.row.fitGiven && a.row.fit !== cross.fit) diff.fit = a.row.fit;
  if (a.row.notes && a.row.notes !== cross.notes) diff.notes = a.row.notes;
  if (cross.status !== "approved") diff.status = "approved";
  if (Object.keys(diff).length > 0) {
    plan.crossUpdates.push({
      line: a.line,
      id: cross.id,
      diff,
      before: { fit: cross.fit, notes: cross.notes, status: cross.status },
    });
    Object.assign(cross, diff);
    plan.counts.updates += 1;
  } else if (partChanged) plan.counts.updates += 1;
  else plan.counts.unchanged += 1;
}

/** Into the review queue: a pending proposal by the importer, unless the cross is approved already. */
function planProposal(
  a: AcceptedRow,
  partId: number | undefined,
  standardId: number | undefined,
  cross: KnownCross | undefined,
  { plan, userId }: PlanContext,
): void {
  if (cross?.status === "approved") {
    plan.counts.unchanged += 1;
    return;
  }
  plan.counts.newCrosses += 1;
  const { row } = a;
  const s = row.standard;
  const dimension = { innerMm: "inner", outerMm: "outer", widthMm: "width", lengthMm: "length" } as const;
  const measurements: Measurement[] = (["innerMm", "outerMm", "widthMm", "lengthMm"] as const)
    .filter((k) => row[k] !== null)
    .map((k) => ({ dimension: dimension[k], value: row[k]!, unit: "mm" }));
  const newPart =
    partId === undefined
      ? {
          makerId: a.maker!.id,
          number: row.number.toUpperCase(),
          description: row.description!,
          category: (row.category ?? CATEGORY_FOR_KIND[s.kind])!,
          machineId: a.machineId,
          assemblyId: a.assemblyId,
          numberNormalised: a.normalised,
        }
      : null;
  const newStandard = standardId === undefined ? { ...s } : null;
  plan.newProposals.push({
    line: a.line,
    partRef: partId ?? null,
    standardRef: standardId ?? null,
    values: { userId, newPart, newStandard, fit: row.fit, measurements, notes: row.notes, checks: [] },
  });
}
