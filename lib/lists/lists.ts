import { randomBytes, timingSafeEqual } from "node:crypto";
import Papa from "papaparse";
import { QueryTypes, type Transaction } from "sequelize";
import { JobList, JobListLine, Machine, OriginalPart, sequelize } from "@/db";
import { recordAudit } from "@/lib/audit/record";
import { lookUpParts, type LookupResult } from "@/lib/catalogue/find-parts";
import {
  CATEGORY_NAMES,
  CAUTION_FOR_CATEGORY,
  FIT_NAMES,
  STANDARD_KIND_NAMES,
  type CautionKind,
  type Fit,
  type PartCategory,
  type StandardKind,
} from "@/lib/catalogue/kinds";
import { rankCrosses, type RankedCross } from "@/lib/catalogue/ranking";
import { coversSerial, parseSerial, serialRangeText, showSerial } from "@/lib/catalogue/serials";
import { standardSizes } from "@/lib/catalogue/sizes";
import { chainMembers, earlierNumbers, loadChain } from "@/lib/catalogue/supersessions";
import { AppError } from "@/lib/errors";
import { CATEGORY_OF_KIND, toStandardItem, type MeasuredKind, type StandardItem } from "@/lib/lists/standard-item";

export interface Equivalent {
  standardPartId: number;
  designation: string;
  kind: StandardKind;
  fit: Fit;
  confirmations: number;
  /** The chain number the cross was recorded on, when not the line's own (see lib/catalogue/ranking). */
  viaNumber: string | null;
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
}

export interface ListLine {
  id: number;
  /** Null for a standard part worked out from measurements (`measured` then says what to order). */
  partId: number | null;
  measured: StandardItem | null;
  number: string;
  /** The older numbers this one replaces, from the catalogue's chain, oldest first. */
  earlierNumbers: string[];
  maker: string;
  description: string;
  category: PartCategory;
  categoryName: string;
  quantity: number;
  notes: string | null;
  supplier: string | null;
  supplierNumber: string | null;
  /** To the cent, as text ("12.50"). */
  unitPrice: string | null;
  ordered: boolean;
  /** The standard parts one can order, in the shared ranking's order. */
  equivalents: Equivalent[];
  chosen: Equivalent | null;
  /** Where the catalogue's best answer is work rather than a part (cut from felt, a repair sleeve), what to do. */
  method: string | null;
  /** Each names the line it is about, so it reads the same on screen, on paper and in a CSV. */
  warnings: string[];
  hasAssembly: boolean;
}

export interface ListView {
  id: number;
  title: string;
  notes: string | null;
  machine: { id: number; model: string; maker: string; makerId: number; serialPrefix: string | null } | null;
  /** The machine's serial as on its plate ("22-4100"), when the list carries one. */
  machineSerial: string | null;
  readOnly: boolean;
  shareToken: string | null;
  updatedAt: string;
  lines: ListLine[];
  totals: Array<{ category: PartCategory; name: string; lines: number; quantity: number }>;
  warnings: number;
  cautions: CautionKind[];
}

/** How long a removed line can be put back. */
export const UNDO_SECONDS = 600;

async function ownList(userId: string, id: number, transaction?: Transaction): Promise<JobList> {
  const list = await JobList.findByPk(id, { transaction });
  // Another member's list is answered as missing, not forbidden: its existence is nobody else's business.
  if (!list || list.userId !== userId) throw new AppError("not_found", "You have no job list with that id.");
  return list;
}

/** A member's job lists, newest change first, with their line and part counts. */
export async function jobListsOf(userId: string) {
  const rows = await sequelize.query<{
    id: number;
    title: string;
    model: string | null;
    lines: string;
    quantity: string | null;
    updated_at: Date;
    share_token: string | null;
  }>(
    `SELECT l.id, l.title, m.model, count(x.id) AS lines, sum(x.quantity) AS quantity, l.updated_at, l.share_token
     FROM job_lists l LEFT JOIN machines m ON m.id = l.machine_id LEFT JOIN job_list_lines x ON x.list_id = l.id AND
       x.removed_at IS NULL
     WHERE l.user_id = :userId GROUP BY l.id, m.model ORDER BY l.updated_at DESC`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    machine: r.model,
    lines: Number(r.lines),
    quantity: Number(r.quantity ?? 0),
    updatedAt: r.updated_at.toISOString(),
    shared: Boolean(r.share_token),
  }));
}

/** The serial as a running number, checked against the machine's own prefix; empty clears it. */
async function serialFor(machineId: number | null, text: string | null | undefined): Promise<number | null> {
  if (!text) return null;
  if (!machineId)
    throw new AppError("validation_failed", "Choose the machine before giving its serial.", { field: "machineSerial" });
  const machine = await Machine.findByPk(machineId, { attributes: ["serialPrefix"] });
  return parseSerial(text, machine?.serialPrefix ?? null);
}

/** A new list; with `firstLine`, the part it was started from goes on it too, or, if that fails, no list is left. */
export async function createList(
  userId: string,
  input: {
    title: string;
    machineId?: number | null;
    machineSerial?: string | null;
    notes?: string;
    firstLine?: Parameters<typeof addLine>[2];
  },
) {
  if (input.machineId && !(await Machine.findByPk(input.machineId)))
    throw new AppError("validation_failed", "There is no machine with that id.", { field: "machineId" });
  const machineSerial = await serialFor(input.machineId ?? null, input.machineSerial);
  const list = await JobList.create({
    userId,
    title: input.title,
    machineId: input.machineId ?? null,
    machineSerial,
    notes: input.notes || null,
  });
  if (!input.firstLine) return { id: list.id, title: list.title, line: null };
  try {
    return { id: list.id, title: list.title, line: await addLine(userId, list.id, input.firstLine) };
  } catch (error) {
    await list.destroy();
    throw error;
  }
}

export async function updateList(
  userId: string,
  id: number,
  patch: { title?: string; machineId?: number | null; machineSerial?: string | null; notes?: string },
) {
  const list = await ownList(userId, id);
  if (patch.machineId && !(await Machine.findByPk(patch.machineId)))
    throw new AppError("validation_failed", "There is no machine with that id.", { field: "machineId" });
  const machineId = patch.machineId !== undefined ? patch.machineId : list.machineId;
  // Another machine's serial means nothing on this one: changing the machine clears a serial not given again.
  const machineSerial =
    patch.machineSerial !== undefined
      ? await serialFor(machineId, patch.machineSerial)
      : machineId === list.machineId
        ? list.machineSerial
        : null;
  await list.update({
    ...(patch.title !== undefined ? { title: patch.title } : {}),
    ...(patch.machineId !== undefined ? { machineId: patch.machineId } : {}),
    machineSerial,
    ...(patch.notes !== undefined ? { notes: patch.notes || null } : {}),
  });
}

export async function deleteList(userId: string, id: number) {
  const list = await ownList(userId, id);
  await list.destroy();
}

/** Turns the read-only link on (a new, unguessable token each time) or off. */
export async function setSharing(userId: string, id: number, enabled: boolean): Promise<string | null> {
  const list = await ownList(userId, id);
  const token = enabled ? randomBytes(24).toString("base64url") : null;
  await list.update({ shareToken: token });
  await recordAudit({
    actorId: userId,
    action: enabled ? "list.share" : "list.unshare",
    subjectType: "job_list",
    subjectId: id,
  });
  return token;
}

/** Each part's standard parts to order, from the shared ranking, and its first answer whatever it is. */
async function equivalentsFor(
  partIds: number[],
): Promise<Map<number, { options: Equivalent[]; first: RankedCross | null }>> {
  const ranked = await rankCrosses(partIds);
  const map = new Map<number, { options: Equivalent[]; first: RankedCross | null }>();
  for (const [partId, crosses] of ranked) {
    const options = crosses.flatMap((c): Equivalent[] =>
      c.standard && c.standardPartId !== null
        ? [
            {
              standardPartId: c.standardPartId,
              designation: c.standard.designation,
              kind: c.standard.kind,
              fit: c.fit,
              confirmations: c.confirmations,
              viaNumber: c.viaNumber,
              innerMm: c.standard.innerMm,
              outerMm: c.standard.outerMm,
              widthMm: c.standard.widthMm,
              lengthMm: c.standard.lengthMm,
            },
          ]
        : [],
    );
    map.set(partId, { options, first: crosses[0] ?? null });
  }
  return map;
}

function sameToken(stored: string | null, given: string): boolean {
  if (!stored) return false;
  const a = Buffer.from(stored);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

interface ListMachine {
  id: number;
  model: string;
  maker: string;
  maker_id: number;
  serial_prefix: string | null;
}

interface LineRow {
  id: number;
  part_id: number | null;
  standard_item: StandardItem | null;
  standard_part_id: number | null;
  quantity: number;
  notes: string | null;
  supplier: string | null;
  supplier_number: string | null;
  unit_price: string | null;
  ordered: boolean;
  number: string | null;
  maker: string | null;
  maker_id: number | null;
  description: string | null;
  category: PartCategory | null;
  has_assembly: boolean;
  used_by_maker: boolean;
}

type SerialRow = { part_id: number; serial_from: number | null; serial_to: number | null };

/** What every line of one list is read against: its machine, serial, equivalents, chain and serial ranges. */
interface LineContext {
  machine: ListMachine | null;
  serial: number | null;
  serialText: string | null;
  equivalents: Awaited<ReturnType<typeof equivalentsFor>>;
  earlier: Map<number, string[]>;
  ranges: SerialRow[];
}

/** The list as its owner sees it, or read-only through its share token. */
export async function getList(access: { userId: string } | { token: string }, id: number): Promise<ListView> {
  const list = await JobList.findByPk(id);
  const readOnly = !("userId" in access);
  const allowed =
    "userId" in access ? list?.userId === access.userId : sameToken(list?.shareToken ?? null, access.token);
  if (!list || !allowed) throw new AppError("not_found", "There is no job list with that id.");
  const machine = list.machineId ? await loadListMachine(list.machineId) : null;
  const lines = await loadLineRows(id, machine?.maker_id ?? 0);
  const partIds = lines.flatMap((l) => (l.part_id === null ? [] : [l.part_id]));
  const serial = machine ? list.machineSerial : null;
  const [equivalents, earlier, ranges] = await Promise.all([
    equivalentsFor(partIds),
    earlierNumbers(partIds),
    machine && serial !== null && partIds.length > 0 ? loadSerialRanges(machine.id, partIds) : Promise.resolve([]),
  ]);
  const serialText = machine && serial !== null ? showSerial(serial, machine.serial_prefix) : null;
  const context: LineContext = { machine, serial, serialText, equivalents, earlier, ranges };
  const view = lines.map((l) => lineView(l, context));
  return {
    id: list.id,
    title: list.title,
    notes: list.notes,
    machine: machine && {
      id: machine.id,
      model: machine.model,
      maker: machine.maker,
      makerId: machine.maker_id,
      serialPrefix: machine.serial_prefix,
    },
    machineSerial: serialText,
    readOnly,
    shareToken: readOnly ? null : list.shareToken,
    updatedAt: list.updatedAt.toISOString(),
    lines: view,
    totals: listTotals(view),
    warnings: view.filter((l) => l.warnings.length > 0).length,
    cautions: await listCautions(view, partIds),
  };
}

async function loadListMachine(machineId: number): Promise<ListMachine | null> {
  const [machine] = await sequelize.query<ListMachine>(
    `SELECT m.id, m.model, k.name AS maker, k.id AS maker_id, m.serial_prefix
     FROM machines m JOIN makers k ON k.id = m.maker_id WHERE m.id = :id`,
    { replacements: { id: machineId }, type: QueryTypes.SELECT },
  );
  return machine ?? null;
}

/** The list's lines with their parts, and whether any machine of the list's maker uses each part. */
function loadLineRows(listId: number, makerId: number): Promise<LineRow[]> {
  return sequelize.query<LineRow>(
    `SELECT x.id, x.part_id, x.standard_item, x.standard_part_id, x.quantity, x.notes, x.supplier, x.supplier_number,
            x.unit_price::text AS unit_price, x.ordered, p.number, k.name AS maker, k.id AS maker_id, p.description,
            p.category,
            EXISTS (SELECT 1 FROM part_usages u JOIN part_usages o ON o.machine_id = u.machine_id
                    AND o.assembly_id = u.assembly_id AND o.part_id <> u.part_id
                    WHERE u.part_id = p.id) AS has_assembly,
            EXISTS (SELECT 1 FROM part_usages u JOIN machines ma ON ma.id = u.machine_id
                    WHERE u.part_id = p.id AND ma.maker_id = :makerId) AS used_by_maker
     FROM job_list_lines x LEFT JOIN original_parts p ON p.id = x.part_id LEFT JOIN makers k ON k.id = p.maker_id
     WHERE x.list_id = :listId AND x.removed_at IS NULL ORDER BY x.id`,
    { replacements: { listId, makerId }, type: QueryTypes.SELECT },
  );
}

function loadSerialRanges(machineId: number, partIds: number[]): Promise<SerialRow[]> {
  return sequelize.query<SerialRow>(
    "SELECT part_id, serial_from, serial_to FROM part_usages WHERE machine_id = :machineId AND part_id IN (:partIds)",
    { replacements: { machineId, partIds }, type: QueryTypes.SELECT },
  );
}

function lineView(l: LineRow, context: LineContext): ListLine {
  const order = {
    supplier: l.supplier,
    supplierNumber: l.supplier_number,
    unitPrice: l.unit_price,
    ordered: l.ordered,
  };
  // The table's check constraint: a line has a factory part or a measured item, never both.
  if (l.part_id === null) return { ...measuredLine(l.id, l.standard_item!, l.quantity, l.notes), ...order };
  const { options, first } = context.equivalents.get(l.part_id) ?? { options: [], first: null };
  const chosen = options.find((o) => o.standardPartId === l.standard_part_id) ?? options[0] ?? null;
  const method = !chosen && first?.repairMethod ? first.repairMethod : null;
  return {
    id: l.id,
    partId: l.part_id,
    measured: null,
    number: l.number!,
    earlierNumbers: context.earlier.get(l.part_id) ?? [],
    maker: l.maker!,
    description: l.description!,
    category: l.category!,
    categoryName: CATEGORY_NAMES[l.category!],
    quantity: l.quantity,
    notes: l.notes,
    ...order,
    equivalents: options,
    chosen,
    method,
    warnings: lineWarnings(l, chosen, method, context),
    hasAssembly: l.has_assembly,
  };
}

/** What to check before ordering a line, each saying which number it is about. */
function lineWarnings(l: LineRow, chosen: Equivalent | null, method: string | null, context: LineContext): string[] {
  const number = l.number!;
  const { machine, serial, serialText } = context;
  const warnings: string[] = [];
  if (!chosen) {
    warnings.push(
      method
        ? `${number}: no standard part to order; the catalogue's answer is work: ${method}`
        : `${number}: no approved standard part yet. Measure it, or size it in the calculators.`,
    );
  } else if (chosen.fit === "with_modification") {
    const read = "Read the notes on the part's page before ordering.";
    warnings.push(`${number} → ${chosen.designation}: fits with modification. ${read}`);
  } else if (chosen.fit === "dimensions_only") {
    warnings.push(`${number} → ${chosen.designation}: a size match only; nobody has reported fitting it yet.`);
  }
  if (machine && !l.used_by_maker && l.maker_id !== machine.maker_id) {
    warnings.push(
      `${number} is a ${l.maker} part that no ${machine.maker} machine uses: check it belongs on this list.`,
    );
  }
  const own = context.ranges.filter((r) => r.part_id === l.part_id);
  const range = (r: SerialRow) => ({ serialFrom: r.serial_from, serialTo: r.serial_to });
  if (machine && serial !== null && own.length > 0 && !own.some((r) => coversSerial(range(r), serial))) {
    const fitted = own.map((r) => serialRangeText(range(r), machine.serial_prefix)).join(" and ");
    warnings.push(`${number} was fitted to the ${machine.model} ${fitted}; this list is for serial ${serialText}.`);
  }
  return warnings;
}

function listTotals(view: ListLine[]): ListView["totals"] {
  const totals = new Map<PartCategory, { lines: number; quantity: number }>();
  for (const l of view) {
    const t = totals.get(l.category) ?? { lines: 0, quantity: 0 };
    t.lines += 1;
    t.quantity += l.quantity;
    totals.set(l.category, t);
  }
  return [...totals.entries()]
    .map(([category, t]) => ({ category, name: CATEGORY_NAMES[category], ...t }))
    .sort((a, b) => a.name.localeCompare(b.name));
}

/** The cautions for the kinds of part on the list and for the places they are fitted (a water pump: hot coolant). */
async function listCautions(view: ListLine[], partIds: number[]): Promise<CautionKind[]> {
  const cautions = new Set<CautionKind>();
  for (const l of view) if (CAUTION_FOR_CATEGORY[l.category]) cautions.add(CAUTION_FOR_CATEGORY[l.category]!);
  if (partIds.length > 0) {
    const places = await sequelize.query<{ caution: CautionKind }>(
      `SELECT DISTINCT a.caution FROM part_usages u JOIN assemblies a ON a.id = u.assembly_id
       WHERE u.part_id IN (:ids) AND a.caution IS NOT NULL`,
      { replacements: { ids: partIds }, type: QueryTypes.SELECT },
    );
    for (const p of places) cautions.add(p.caution);
  }
  return [...cautions];
}

/** A line for a standard part worked out from measurements: what to order is the item itself. */
function measuredLine(
  id: number,
  item: StandardItem,
  quantity: number,
  notes: string | null,
): Omit<ListLine, "supplier" | "supplierNumber" | "unitPrice" | "ordered"> {
  const category = CATEGORY_OF_KIND[item.kind];
  const chosen: Equivalent = {
    // Not a catalogue row: 0 is no standard part's id, and a measured line offers no other equivalents to pick.
    standardPartId: 0,
    designation: item.designation,
    kind: item.kind,
    fit: "dimensions_only",
    confirmations: 0,
    viaNumber: null,
    innerMm: item.innerMm,
    outerMm: item.outerMm,
    widthMm: item.widthMm,
    lengthMm: item.lengthMm,
  };
  return {
    id,
    partId: null,
    measured: item,
    number: item.designation,
    earlierNumbers: [],
    maker: "Standard part",
    description: item.note ?? `${STANDARD_KIND_NAMES[item.kind]} sized from measurements`,
    category,
    categoryName: CATEGORY_NAMES[category],
    quantity,
    notes,
    equivalents: [],
    chosen,
    method: null,
    warnings: [],
    hasAssembly: false,
  };
}

async function lockList(listId: number, transaction: Transaction): Promise<void> {
  await JobList.findByPk(listId, { attributes: ["id"], transaction, lock: transaction.LOCK.UPDATE });
}

/** A part a typed number might mean, for the person to pick. */
export interface NumberChoice {
  partId: number;
  number: string;
  maker: string;
  description: string;
}

/**
 * A typed factory number to one part: a single exact, reformatted or look-alike match is taken (and `read` says what
 * it was read as when that is not what was typed); several, or only similar numbers, come back as choices.
 */
async function resolveNumber(number: string): Promise<{ id: number; read: string | null }> {
  const results = await lookUpParts(number, { limit: 8 });
  const choice = (r: LookupResult): NumberChoice => ({
    partId: r.id,
    number: r.number,
    maker: r.maker,
    description: r.description,
  });
  for (const kinds of [["exact"], ["exact", "normalised"], ["exact", "normalised", "misread"]]) {
    const hits = results.filter((r) => kinds.includes(r.matchedBy));
    if (hits.length === 1) return { id: hits[0].id, read: hits[0].matchedBy === "exact" ? null : hits[0].number };
    if (hits.length > 1)
      throw new AppError("validation_failed", `Several parts have that number. Pick one.`, {
        field: "number",
        choices: hits.map(choice),
      });
  }
  const near = results.filter((r) => r.matchedBy !== "words").slice(0, 4);
  if (near.length > 0)
    throw new AppError("validation_failed", `No part has exactly that number. Did you mean one of these?`, {
      field: "number",
      choices: near.map(choice),
    });
  throw new AppError(
    "validation_failed",
    "No part has that number in the catalogue. Check the stamping, or measure the part.",
    { field: "number" },
  );
}

/**
 * Adds a part (by id, or by a typed factory number) as its latest number after supersessions, with the shared
 * ranking's best standard part chosen; a part already on the list has its quantity raised instead.
 */
export async function addLine(
  userId: string,
  listId: number,
  input: {
    partId?: number;
    number?: string;
    standard?: { kind: MeasuredKind; designation: string; note?: string; template?: string };
    quantity: number;
    notes?: string;
  },
) {
  await ownList(userId, listId);
  if (input.standard) return addMeasuredLine(listId, toStandardItem(input.standard), input.quantity, input.notes);
  let requested: string | null = null;
  let read: string | null = null;
  let partId: number;
  if (input.partId) {
    if (!(await OriginalPart.findByPk(input.partId, { attributes: ["id"] })))
      throw new AppError("validation_failed", "There is no part with that id.", { field: "partId" });
    partId = input.partId;
  } else {
    const resolved = await resolveNumber(input.number!);
    partId = resolved.id;
    read = resolved.read;
    requested = input.number!.trim();
  }
  const chain = await loadChain(partId);
  const latestId = chain.latestId;
  // Read before the transaction: inside it, a query without the transaction would take a second pooled connection
  // while this one holds the list's lock, and a burst of adds would exhaust the pool waiting on each other.
  const best = (await equivalentsFor([latestId])).get(latestId)?.options[0] ?? null;
  const latestNumber =
    latestId !== partId ? ((await OriginalPart.findByPk(latestId, { attributes: ["number"] }))?.number ?? null) : null;
  const result = await sequelize.transaction(async (transaction) => {
    // Adds to one list take turns (the list row is locked), so two quick clicks merge instead of colliding.
    await lockList(listId, transaction);
    const existing = await JobListLine.findOne({ where: { listId, partId: latestId, removedAt: null }, transaction });
    if (existing) {
      await existing.update({ quantity: Math.min(existing.quantity + input.quantity, 9999) }, { transaction });
      await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
      return { lineId: existing.id, merged: true };
    }
    const line = await JobListLine.create(
      {
        listId,
        partId: latestId,
        requestedNumber: requested,
        standardPartId: best?.standardPartId ?? null,
        quantity: input.quantity,
        notes: input.notes || null,
      },
      { transaction },
    );
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return { lineId: line.id, merged: false };
  });
  return { ...result, partId: latestId, superseded: latestId !== partId, read, latestNumber };
}

/** A standard part from a calculator, by designation and sizes; the same part added again raises its quantity. */
async function addMeasuredLine(listId: number, item: StandardItem, quantity: number, notes: string | undefined) {
  return sequelize.transaction(async (transaction) => {
    await lockList(listId, transaction);
    const [existing] = await sequelize.query<{ id: number; quantity: number }>(
      `SELECT id, quantity FROM job_list_lines
       WHERE list_id = :listId AND part_id IS NULL AND removed_at IS NULL AND standard_item->>'kind' = :kind AND
         upper(standard_item->>'designation') = upper(:designation)`,
      {
        replacements: { listId, kind: item.kind, designation: item.designation },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (existing) {
      await JobListLine.update(
        { quantity: Math.min(existing.quantity + quantity, 9999) },
        { where: { id: existing.id }, transaction },
      );
    }
    const line =
      existing ??
      (await JobListLine.create(
        {
          listId,
          partId: null,
          standardItem: item,
          requestedNumber: null,
          standardPartId: null,
          quantity,
          notes: notes || null,
        },
        { transaction },
      ));
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return {
      lineId: line.id,
      partId: null,
      merged: Boolean(existing),
      superseded: false,
      read: null,
      latestNumber: null,
    };
  });
}

export async function updateLine(
  userId: string,
  listId: number,
  lineId: number,
  patch: {
    quantity?: number;
    notes?: string;
    standardPartId?: number | null;
    supplier?: string;
    supplierNumber?: string;
    unitPrice?: string | null;
    ordered?: boolean;
  },
) {
  await ownList(userId, listId);
  const line = await JobListLine.findOne({ where: { id: lineId, listId, removedAt: null } });
  if (!line) throw new AppError("not_found", "That line is not on this list.");
  if (patch.standardPartId) {
    const options = line.partId === null ? [] : ((await equivalentsFor([line.partId])).get(line.partId)?.options ?? []);
    if (!options.some((o) => o.standardPartId === patch.standardPartId)) {
      throw new AppError("validation_failed", "That standard part is not an approved equivalent of this part.", {
        field: "standardPartId",
      });
    }
  }
  await line.update({
    ...(patch.quantity !== undefined ? { quantity: patch.quantity } : {}),
    ...(patch.notes !== undefined ? { notes: patch.notes || null } : {}),
    ...(patch.standardPartId !== undefined ? { standardPartId: patch.standardPartId } : {}),
    ...(patch.supplier !== undefined ? { supplier: patch.supplier || null } : {}),
    ...(patch.supplierNumber !== undefined ? { supplierNumber: patch.supplierNumber || null } : {}),
    ...(patch.unitPrice !== undefined ? { unitPrice: patch.unitPrice } : {}),
    ...(patch.ordered !== undefined ? { ordered: patch.ordered } : {}),
  });
  await JobList.update({ updatedAt: new Date() }, { where: { id: listId } });
}

/** Takes a line off the list; it is kept for `UNDO_SECONDS` so that the removal can be undone. */
export async function removeLine(userId: string, listId: number, lineId: number) {
  await ownList(userId, listId);
  await sequelize.transaction(async (transaction) => {
    const [, removed] = await sequelize.query(
      "UPDATE job_list_lines SET removed_at = now(), updated_at = now() WHERE " +
        "id = :lineId AND list_id = :listId AND removed_at IS NULL",
      {
        replacements: { lineId, listId },
        type: QueryTypes.UPDATE,
        transaction,
      },
    );
    if (removed === 0) throw new AppError("not_found", "That line is not on this list.");
    // Lines removed long ago are gone for good.
    await sequelize.query(
      `DELETE FROM job_list_lines WHERE list_id = :listId AND removed_at < now() - interval '${UNDO_SECONDS} seconds'`,
      { replacements: { listId }, transaction },
    );
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
  });
  return { undoSeconds: UNDO_SECONDS };
}

/**
 * Puts a removed line back. If the same part (or measured item) was added again in the meantime, the two merge:
 * the quantity of the removed line is added to the one on the list.
 */
export async function restoreLine(userId: string, listId: number, lineId: number) {
  await ownList(userId, listId);
  return sequelize.transaction(async (transaction) => {
    await lockList(listId, transaction);
    const line = await JobListLine.findOne({ where: { id: lineId, listId }, transaction });
    const fresh = line?.removedAt && Date.now() - line.removedAt.getTime() <= UNDO_SECONDS * 1000;
    if (!line || !line.removedAt)
      throw new AppError("not_found", "That line is not removed from this list, so there is nothing to undo.");
    if (!fresh) throw new AppError("conflict", "That removal is too old to undo. Add the part again.");
    const [twin] = await sequelize.query<{ id: number }>(
      line.partId !== null
        ? "SELECT id FROM job_list_lines WHERE list_id = :listId AND part_id = :partId AND removed_at IS NULL"
        : "SELECT id FROM job_list_lines WHERE list_id = :listId AND part_id IS " +
            "NULL AND removed_at IS NULL AND standard_item->>'kind' = :kind AND " +
            "upper(standard_item->>'designation') = upper(:designation)",
      {
        replacements: {
          listId,
          partId: line.partId,
          kind: line.standardItem?.kind ?? "",
          designation: line.standardItem?.designation ?? "",
        },
        type: QueryTypes.SELECT,
        transaction,
      },
    );
    if (twin) {
      await sequelize.query(
        "UPDATE job_list_lines SET quantity = least(quantity + :quantity, 9999), updated_at = now() WHERE id = :id",
        { replacements: { id: twin.id, quantity: line.quantity }, transaction },
      );
      await line.destroy({ transaction });
    } else {
      await line.update({ removedAt: null }, { transaction });
    }
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return { lineId: twin?.id ?? line.id, merged: Boolean(twin) };
  });
}

/** A serial range of an assembly, for the person to say which their machine is in. */
export interface SerialChoice {
  /** A serial inside the range, as on the plate: sending it back picks the range. */
  serial: string;
  label: string;
}

export interface PlaceUsage {
  part_id: number;
  position: string;
  quantity: number;
  serial_from: number | null;
  serial_to: number | null;
}

type SerialRange = { serialFrom: number | null; serialTo: number | null };

/**
 * One part for each open position of an assembly, under its latest number: the one for `serial`, or, with no serial,
 * the one the line's own serials (`own`) allow, since an early-only bearing means an early machine. Positions where
 * several parts remain and their records say which serials each was for come back `undecided`, to ask about.
 */
export function planPositions(
  positions: Map<string, PlaceUsage[]>,
  latestOf: Map<number, number>,
  serial: number | null,
  own: SerialRange,
) {
  const overlapsOwn = (u: PlaceUsage) =>
    (u.serial_to === null || own.serialFrom === null || u.serial_to >= own.serialFrom) &&
    (u.serial_from === null || own.serialTo === null || u.serial_from <= own.serialTo);
  const planned: Array<{ partId: number; quantity: number }> = [];
  const undecided: PlaceUsage[][] = [];
  for (const candidates of positions.values()) {
    const fitting =
      serial === null
        ? candidates.filter(overlapsOwn)
        : candidates.filter((u) => coversSerial({ serialFrom: u.serial_from, serialTo: u.serial_to }, serial));
    const distinct = [...new Map(fitting.map((u) => [latestOf.get(u.part_id)!, u])).entries()];
    if (distinct.length === 0) continue;
    if (distinct.length > 1 && serial === null && fitting.some((u) => u.serial_from !== null || u.serial_to !== null)) {
      undecided.push(fitting);
      continue;
    }
    // One part per position: with a serial there is one; records that still overlap give the earliest-listed.
    const [partId, u] = distinct[0];
    if (!planned.some((p) => p.partId === partId)) planned.push({ partId, quantity: u.quantity });
  }
  return { planned, undecided };
}

/** The ranges the breaks of an assembly's serial-bound parts cut the serials into, each with a serial inside it. */
function serialChoices(usages: PlaceUsage[], prefix: string | null, within: SerialRange): SerialChoice[] {
  const inside = (v: number) =>
    (within.serialFrom === null || v > within.serialFrom) && (within.serialTo === null || v <= within.serialTo);
  const breaks = [
    ...new Set(
      usages
        .flatMap((u) => [u.serial_from, u.serial_to === null ? null : u.serial_to + 1])
        .filter((v): v is number => v !== null && inside(v)),
    ),
  ].sort((a, b) => a - b);
  const choices: SerialChoice[] = [];
  for (let i = 0; i <= breaks.length; i += 1) {
    const from = i === 0 ? within.serialFrom : breaks[i - 1];
    const to = i === breaks.length ? within.serialTo : breaks[i] - 1;
    const serial = from ?? Math.max(to ?? 1, 1);
    const label =
      from === null
        ? `up to ${showSerial(to!, prefix)}`
        : to === null
          ? `${showSerial(from, prefix)} and later`
          : `${showSerial(from, prefix)} to ${showSerial(to, prefix)}`;
    choices.push({ serial: showSerial(serial, prefix), label });
  }
  return choices;
}

/**
 * "Add the rest of the assembly": one part for each other position of the assembly this line's part sits in, on the
 * list's machine (or the first machine that uses it), each at the quantity the machine uses.
 *
 * Where a position's part changed at a serial, the list's machine serial (or `serial`, given for this add) picks the
 * one; with neither, nothing is added and the answer lists the serial ranges to choose from. A position the list
 * already fills (by this number, an older or newer one of its chain, or any other part in that position) is skipped.
 */
export async function addRestOfAssembly(
  userId: string,
  listId: number,
  lineId: number,
  input: { serial?: string } = {},
) {
  const list = await ownList(userId, listId);
  const line = await JobListLine.findOne({ where: { id: lineId, listId, removedAt: null } });
  if (!line) throw new AppError("not_found", "That line is not on this list.");
  if (line.partId === null) {
    const reason = "This line is a standard part sized from measurements; it belongs to no assembly.";
    throw new AppError("validation_failed", reason, { field: "lineId" });
  }
  const usage = await placeOfPart(line.partId, list.machineId);
  const serial = input.serial
    ? parseSerial(input.serial, usage.serial_prefix, "serial")
    : usage.machine_id === list.machineId
      ? list.machineSerial
      : null;
  const { positions, filled, latestOf } = await openPositions(listId, usage);
  const own = { serialFrom: usage.serial_from, serialTo: usage.serial_to };
  const { planned, undecided } = planPositions(positions, latestOf, serial, own);
  if (undecided.length > 0) {
    const choices = serialChoices(undecided.flat(), usage.serial_prefix, own);
    if (choices.length > 1) {
      const question = `Parts of the ${usage.model} ${usage.assembly.toLowerCase()} changed with the serial number.`;
      throw new AppError("validation_failed", `${question} Which serial is the machine?`, { field: "serial", choices });
    }
    // Records that overlap with no serial between them to tell them apart: the earliest-listed part of each.
    for (const fitting of undecided) {
      planned.push({ partId: latestOf.get(fitting[0].part_id)!, quantity: fitting[0].quantity });
    }
  }
  const added = await insertPlanned(listId, planned);
  return {
    added,
    machine: usage.model,
    assembly: usage.assembly,
    serial: serial === null ? null : showSerial(serial, usage.serial_prefix),
    /** When no serial was given, the serials the line's own part was fitted to, which chose the parts. */
    serials: serial === null ? serialRangeText(own, usage.serial_prefix) : null,
    skipped: [...filled].filter((p) => p !== usage.position),
  };
}

interface PartPlace {
  machine_id: number;
  assembly_id: number;
  model: string;
  assembly: string;
  position: string;
  serial_prefix: string | null;
  serial_from: number | null;
  serial_to: number | null;
}

/** Where a part (or a number of its chain) is fitted: on the list's machine first, else the first machine using it. */
async function placeOfPart(partId: number, listMachineId: number | null): Promise<PartPlace> {
  const chain = (await chainMembers([partId])).get(partId)!;
  const [usage] = await sequelize.query<PartPlace>(
    `SELECT u.machine_id, u.assembly_id, m.model, a.name AS assembly, coalesce(u.position, p.description) AS position,
            m.serial_prefix, u.serial_from, u.serial_to
     FROM part_usages u JOIN machines m ON m.id = u.machine_id JOIN assemblies a ON a.id = u.assembly_id
       JOIN original_parts p ON p.id = u.part_id
     WHERE u.part_id IN (:chain)
     ORDER BY (u.machine_id = :machineId) DESC, (u.part_id = :partId) DESC, m.model, a.name LIMIT 1`,
    { replacements: { chain, partId, machineId: listMachineId ?? 0 }, type: QueryTypes.SELECT },
  );
  if (!usage) {
    const reason = "The catalogue does not say where this part is fitted, so it has no assembly to add.";
    throw new AppError("validation_failed", reason, { field: "lineId" });
  }
  return usage;
}

/**
 * The assembly's positions the list does not fill yet, with the parts recorded for each and every part's latest
 * number. A position is filled by any line whose part, or any number of its chain, sits in it.
 */
async function openPositions(listId: number, usage: PartPlace) {
  const place = await sequelize.query<PlaceUsage>(
    `SELECT u.part_id, coalesce(u.position, p.description) AS position, u.quantity, u.serial_from, u.serial_to
     FROM part_usages u JOIN original_parts p ON p.id = u.part_id
     WHERE u.machine_id = :machineId AND u.assembly_id = :assemblyId ORDER BY u.serial_from NULLS FIRST, u.part_id`,
    { replacements: { machineId: usage.machine_id, assemblyId: usage.assembly_id }, type: QueryTypes.SELECT },
  );
  const lines = await JobListLine.findAll({ where: { listId, removedAt: null }, attributes: ["partId"] });
  const listed = lines.flatMap((l) => (l.partId === null ? [] : [l.partId]));
  const onList = new Set([...(await chainMembers(listed)).values()].flat());
  const filled = new Set([usage.position, ...place.filter((u) => onList.has(u.part_id)).map((u) => u.position)]);
  const positions = new Map<string, PlaceUsage[]>();
  for (const u of place) {
    if (!filled.has(u.position)) positions.set(u.position, [...(positions.get(u.position) ?? []), u]);
  }
  const ids = [...new Set(place.map((u) => u.part_id))];
  const latestOf = new Map(await Promise.all(ids.map(async (id) => [id, (await loadChain(id)).latestId] as const)));
  return { positions, filled, latestOf };
}

/** Every planned line written in one transaction (all of the assembly lands, or none), skipping parts listed since. */
async function insertPlanned(listId: number, planned: Array<{ partId: number; quantity: number }>): Promise<number> {
  const best = await equivalentsFor(planned.map((p) => p.partId));
  return sequelize.transaction(async (transaction) => {
    await lockList(listId, transaction);
    const lines = await JobListLine.findAll({
      where: { listId, removedAt: null },
      attributes: ["partId"],
      transaction,
    });
    const now = new Set(lines.map((l) => l.partId));
    const rows = planned
      .filter((p) => !now.has(p.partId))
      .map((p) => ({
        listId,
        partId: p.partId,
        requestedNumber: null,
        quantity: p.quantity,
        standardPartId: best.get(p.partId)?.options[0]?.standardPartId ?? null,
        notes: null,
      }));
    await JobListLine.bulkCreate(rows, { transaction });
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return rows.length;
  });
}

/** One row a line: what to order, by standard designation and sizes, with the shop's own supplier details. */
export function listCsv(view: ListView): string {
  const fields = [
    "List",
    "Machine",
    "Serial",
    "Factory number",
    "Earlier numbers",
    "Maker",
    "Description",
    "Standard designation",
    "Kind of part",
    "Sizes",
    "Fit",
    "Quantity",
    "Supplier",
    "Supplier's number",
    "Unit price",
    "Ordered",
    "Notes",
  ];
  const machine = view.machine ? `${view.machine.maker} ${view.machine.model}` : "";
  const data = view.lines.map((l) => [
    view.title,
    machine,
    view.machineSerial ?? "",
    l.partId === null ? "" : l.number,
    l.earlierNumbers.join(", "),
    l.partId === null ? "" : l.maker,
    l.description,
    l.chosen?.designation ?? "",
    l.chosen ? STANDARD_KIND_NAMES[l.chosen.kind] : l.categoryName,
    l.chosen ? standardSizes(l.chosen) : "",
    l.measured
      ? "sized from measurements"
      : l.chosen
        ? FIT_NAMES[l.chosen.fit].word
        : l.method
          ? `no standard part: ${l.method}`
          : "no approved standard part",
    l.quantity,
    l.supplier ?? "",
    l.supplierNumber ?? "",
    l.unitPrice ?? "",
    l.ordered ? "yes" : "",
    l.notes ?? "",
  ]);
  return Papa.unparse({ fields, data }, { newline: "\r\n", escapeFormulae: true });
}

export function csvFileName(view: ListView): string {
  const slug =
    view.title
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 60) || "job-list";
  return `${slug}.csv`;
}
