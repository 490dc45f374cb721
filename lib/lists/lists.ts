import { randomBytes, timingSafeEqual } from "node:crypto";
import Papa from "papaparse";
import { QueryTypes, type Transaction } from "sequelize";
import { JobList, JobListLine, Machine, OriginalPart, sequelize } from "@/db";
import { recordAudit } from "@/lib/audit/record";
import { findPartsByNumber } from "@/lib/catalogue/find-parts";
import { CATEGORY_NAMES, FIT_NAMES, STANDARD_KIND_NAMES, type CautionKind, type Fit, type PartCategory, type StandardKind } from "@/lib/catalogue/kinds";
import { loadChain } from "@/lib/catalogue/supersessions";
import { AppError } from "@/lib/errors";
import { CATEGORY_OF_KIND, toStandardItem, type MeasuredKind, type StandardItem } from "@/lib/lists/standard-item";

export interface Equivalent {
  standardPartId: number;
  designation: string;
  kind: StandardKind;
  fit: Fit;
  confirmations: number;
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
  requestedNumber: string | null;
  maker: string;
  description: string;
  category: PartCategory;
  categoryName: string;
  quantity: number;
  notes: string | null;
  equivalents: Equivalent[];
  chosen: Equivalent | null;
  warnings: string[];
  hasAssembly: boolean;
}

export interface ListView {
  id: number;
  title: string;
  notes: string | null;
  machine: { id: number; model: string; maker: string } | null;
  readOnly: boolean;
  shareToken: string | null;
  updatedAt: string;
  lines: ListLine[];
  totals: Array<{ category: PartCategory; name: string; lines: number; quantity: number }>;
  warnings: number;
  cautions: CautionKind[];
}

const CAUTIONS: Partial<Record<PartCategory, CautionKind>> = { bearing: "bearings", v_belt: "belts", lip_seal: "seals", felt_seal: "seals", gasket: "seals" };

async function ownList(userId: string, id: number, transaction?: Transaction): Promise<JobList> {
  const list = await JobList.findByPk(id, { transaction });
  // Another member's list is answered as missing, not forbidden: its existence is nobody else's business.
  if (!list || list.userId !== userId) throw new AppError("not_found", "You have no job list with that id.");
  return list;
}

export async function listLists(userId: string) {
  const rows = await sequelize.query<{ id: number; title: string; model: string | null; lines: string; quantity: string | null; updated_at: Date; share_token: string | null }>(
    `SELECT l.id, l.title, m.model, count(x.id) AS lines, sum(x.quantity) AS quantity, l.updated_at, l.share_token
     FROM job_lists l LEFT JOIN machines m ON m.id = l.machine_id LEFT JOIN job_list_lines x ON x.list_id = l.id
     WHERE l.user_id = :userId GROUP BY l.id, m.model ORDER BY l.updated_at DESC`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ id: r.id, title: r.title, machine: r.model, lines: Number(r.lines), quantity: Number(r.quantity ?? 0), updatedAt: r.updated_at.toISOString(), shared: Boolean(r.share_token) }));
}

export async function createList(userId: string, input: { title: string; machineId?: number | null; notes?: string }) {
  if (input.machineId && !(await Machine.findByPk(input.machineId))) throw new AppError("validation_failed", "There is no machine with that id.", { field: "machineId" });
  const list = await JobList.create({ userId, title: input.title, machineId: input.machineId ?? null, notes: input.notes || null });
  return { id: list.id, title: list.title };
}

export async function updateList(userId: string, id: number, patch: { title?: string; machineId?: number | null; notes?: string }) {
  const list = await ownList(userId, id);
  if (patch.machineId && !(await Machine.findByPk(patch.machineId))) throw new AppError("validation_failed", "There is no machine with that id.", { field: "machineId" });
  await list.update({
    ...(patch.title !== undefined ? { title: patch.title } : {}),
    ...(patch.machineId !== undefined ? { machineId: patch.machineId } : {}),
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
  await recordAudit({ actorId: userId, action: enabled ? "list.share" : "list.unshare", subjectType: "job_list", subjectId: id });
  return token;
}

async function equivalentsFor(partIds: number[]): Promise<Map<number, Equivalent[]>> {
  const map = new Map<number, Equivalent[]>();
  if (partIds.length === 0) return map;
  const rows = await sequelize.query<{ part_id: number; id: number; designation: string; kind: StandardKind; fit: Fit; confirmations: string; inner_mm: number | null; outer_mm: number | null; width_mm: number | null; length_mm: number | null }>(
    `SELECT c.original_part_id AS part_id, s.id, s.designation, s.kind, c.fit, s.inner_mm, s.outer_mm, s.width_mm, s.length_mm,
            (SELECT count(*) FROM confirmations f WHERE f.cross_id = c.id) AS confirmations
     FROM crosses c JOIN standard_parts s ON s.id = c.standard_part_id
     WHERE c.original_part_id IN (:partIds) AND c.status = 'approved'`,
    { replacements: { partIds }, type: QueryTypes.SELECT },
  );
  const fitRank: Record<Fit, number> = { direct: 0, with_modification: 1, dimensions_only: 2 };
  for (const r of rows) {
    const list = map.get(r.part_id) ?? [];
    list.push({ standardPartId: r.id, designation: r.designation, kind: r.kind, fit: r.fit, confirmations: Number(r.confirmations), innerMm: r.inner_mm, outerMm: r.outer_mm, widthMm: r.width_mm, lengthMm: r.length_mm });
    map.set(r.part_id, list);
  }
  for (const list of map.values()) list.sort((a, b) => fitRank[a.fit] - fitRank[b.fit] || b.confirmations - a.confirmations || a.designation.localeCompare(b.designation));
  return map;
}

function sameToken(stored: string | null, given: string): boolean {
  if (!stored) return false;
  const a = Buffer.from(stored);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** The list as its owner sees it, or read-only through its share token. */
export async function getList(access: { userId: string } | { token: string }, id: number): Promise<ListView> {
  const list = await JobList.findByPk(id);
  const readOnly = !("userId" in access);
  const allowed = "userId" in access ? list?.userId === access.userId : sameToken(list?.shareToken ?? null, access.token);
  if (!list || !allowed) throw new AppError("not_found", "There is no job list with that id.");
  const machine = list.machineId
    ? (await sequelize.query<{ id: number; model: string; maker: string }>("SELECT m.id, m.model, k.name AS maker FROM machines m JOIN makers k ON k.id = m.maker_id WHERE m.id = :id", { replacements: { id: list.machineId }, type: QueryTypes.SELECT }))[0] ?? null
    : null;
  const lines = await sequelize.query<{ id: number; part_id: number | null; standard_item: StandardItem | null; requested_number: string | null; standard_part_id: number | null; quantity: number; notes: string | null; number: string | null; maker: string | null; description: string | null; category: PartCategory | null; has_assembly: boolean }>(
    `SELECT x.id, x.part_id, x.standard_item, x.requested_number, x.standard_part_id, x.quantity, x.notes, p.number, k.name AS maker, p.description, p.category,
            EXISTS (SELECT 1 FROM part_usages u JOIN part_usages o ON o.machine_id = u.machine_id AND o.assembly_id = u.assembly_id AND o.part_id <> u.part_id WHERE u.part_id = p.id) AS has_assembly
     FROM job_list_lines x LEFT JOIN original_parts p ON p.id = x.part_id LEFT JOIN makers k ON k.id = p.maker_id
     WHERE x.list_id = :id ORDER BY x.id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  const equivalents = await equivalentsFor(lines.flatMap((l) => (l.part_id === null ? [] : [l.part_id])));
  const view: ListLine[] = lines.map((l) => {
    // The table's check constraint: a line has a factory part or a measured item, never both.
    if (l.part_id === null) return measuredLine(l.id, l.standard_item!, l.quantity, l.notes);
    const options = equivalents.get(l.part_id) ?? [];
    const chosen = options.find((o) => o.standardPartId === l.standard_part_id) ?? options[0] ?? null;
    const warnings: string[] = [];
    if (!chosen) warnings.push("No approved cross: measure the part, or find the standard size in the calculators.");
    else if (chosen.fit === "with_modification") warnings.push(`${FIT_NAMES.with_modification.word}: read the notes on the part page before ordering.`);
    else if (chosen.fit === "dimensions_only") warnings.push("Size match only: nobody has reported fitting it yet.");
    return {
      id: l.id,
      partId: l.part_id,
      measured: null,
      number: l.number!,
      requestedNumber: l.requested_number && l.requested_number !== l.number ? l.requested_number : null,
      maker: l.maker!,
      description: l.description!,
      category: l.category!,
      categoryName: CATEGORY_NAMES[l.category!],
      quantity: l.quantity,
      notes: l.notes,
      equivalents: options,
      chosen,
      warnings,
      hasAssembly: l.has_assembly,
    };
  });
  const totals = new Map<PartCategory, { lines: number; quantity: number }>();
  for (const l of view) {
    const t = totals.get(l.category) ?? { lines: 0, quantity: 0 };
    t.lines += 1;
    t.quantity += l.quantity;
    totals.set(l.category, t);
  }
  const cautions = new Set<CautionKind>();
  for (const l of view) if (CAUTIONS[l.category]) cautions.add(CAUTIONS[l.category]!);
  // The places the parts are fitted carry their own cautions (a water pump: hot coolant under pressure).
  if (view.length > 0) {
    const places = await sequelize.query<{ caution: CautionKind }>(
      "SELECT DISTINCT a.caution FROM part_usages u JOIN assemblies a ON a.id = u.assembly_id WHERE u.part_id IN (:ids) AND a.caution IS NOT NULL",
      { replacements: { ids: view.map((l) => l.partId ?? 0) }, type: QueryTypes.SELECT },
    );
    for (const p of places) cautions.add(p.caution);
  }
  return {
    id: list.id,
    title: list.title,
    notes: list.notes,
    machine,
    readOnly,
    shareToken: readOnly ? null : list.shareToken,
    updatedAt: list.updatedAt.toISOString(),
    lines: view,
    totals: [...totals.entries()].map(([category, t]) => ({ category, name: CATEGORY_NAMES[category], ...t })).sort((a, b) => a.name.localeCompare(b.name)),
    warnings: view.filter((l) => l.warnings.length > 0).length,
    cautions: [...cautions],
  };
}

/** A line for a standard part worked out from measurements: what to order is the item itself. */
function measuredLine(id: number, item: StandardItem, quantity: number, notes: string | null): ListLine {
  const category = CATEGORY_OF_KIND[item.kind];
  const chosen: Equivalent = {
    // Not a catalogue row: 0 is no standard part's id, and a measured line offers no other equivalents to pick.
    standardPartId: 0,
    designation: item.designation,
    kind: item.kind,
    fit: "dimensions_only",
    confirmations: 0,
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
    requestedNumber: null,
    maker: "Standard part",
    description: item.note ?? `${STANDARD_KIND_NAMES[item.kind]} sized from measurements`,
    category,
    categoryName: CATEGORY_NAMES[category],
    quantity,
    notes,
    equivalents: [],
    chosen,
    warnings: [],
    hasAssembly: false,
  };
}

async function lockList(listId: number, transaction: Transaction): Promise<void> {
  await JobList.findByPk(listId, { attributes: ["id"], transaction, lock: transaction.LOCK.UPDATE });
}

/** A typed factory number to one part: a single exact or reformatted match, else the reason. */
async function resolveNumber(number: string): Promise<{ id: number; typed: string }> {
  const results = await findPartsByNumber(number, 5);
  const sure = results.filter((r) => r.matchedBy === "exact" || r.matchedBy === "normalised");
  if (sure.length === 1) return { id: sure[0].id, typed: number.trim() };
  if (sure.length > 1) {
    throw new AppError("validation_failed", `Several parts have that number: ${sure.map((r) => `${r.number} (${r.maker})`).join(", ")}. Add it from its part page.`, { field: "number" });
  }
  const near = results.slice(0, 3).map((r) => r.number);
  throw new AppError("validation_failed", near.length ? `No part has exactly that number. Did you mean ${near.join(", ")}?` : "No part has that number in the catalogue.", { field: "number" });
}

/**
 * Adds a part (by id, or by a typed factory number) as its latest number after supersessions, with the best
 * approved equivalent chosen; a part already on the list has its quantity raised instead.
 */
export async function addLine(
  userId: string,
  listId: number,
  input: { partId?: number; number?: string; standard?: { kind: MeasuredKind; designation: string; note?: string }; quantity: number; notes?: string },
) {
  await ownList(userId, listId);
  if (input.standard) return addMeasuredLine(listId, toStandardItem(input.standard), input.quantity, input.notes);
  let requested: string | null = null;
  let partId: number;
  if (input.partId) {
    if (!(await OriginalPart.findByPk(input.partId, { attributes: ["id"] }))) throw new AppError("validation_failed", "There is no part with that id.", { field: "partId" });
    partId = input.partId;
  } else {
    const resolved = await resolveNumber(input.number!);
    partId = resolved.id;
    requested = resolved.typed;
  }
  const original = await OriginalPart.findByPk(partId, { attributes: ["number"] });
  const chain = await loadChain(partId);
  const latestId = chain.latestId;
  requested ??= latestId !== partId ? original!.number : null;
  // Read before the transaction: inside it, a query without the transaction would take a second pooled connection
  // while this one holds the list's lock, and a burst of adds would exhaust the pool waiting on each other.
  const best = (await equivalentsFor([latestId])).get(latestId)?.[0] ?? null;
  return sequelize.transaction(async (transaction) => {
    // Adds to one list take turns (the list row is locked), so two quick clicks merge instead of colliding.
    await lockList(listId, transaction);
    const existing = await JobListLine.findOne({ where: { listId, partId: latestId }, transaction });
    if (existing) {
      await existing.update({ quantity: Math.min(existing.quantity + input.quantity, 9999) }, { transaction });
      await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
      return { lineId: existing.id, partId: latestId, merged: true, superseded: latestId !== partId };
    }
    const line = await JobListLine.create(
      { listId, partId: latestId, requestedNumber: requested, standardPartId: best?.standardPartId ?? null, quantity: input.quantity, notes: input.notes || null },
      { transaction },
    );
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return { lineId: line.id, partId: latestId, merged: false, superseded: latestId !== partId };
  });
}

/** A standard part from a calculator, by designation and sizes; the same part added again raises its quantity. */
async function addMeasuredLine(listId: number, item: StandardItem, quantity: number, notes: string | undefined) {
  return sequelize.transaction(async (transaction) => {
    await lockList(listId, transaction);
    const [existing] = await sequelize.query<{ id: number; quantity: number }>(
      `SELECT id, quantity FROM job_list_lines
       WHERE list_id = :listId AND part_id IS NULL AND standard_item->>'kind' = :kind AND upper(standard_item->>'designation') = upper(:designation)`,
      { replacements: { listId, kind: item.kind, designation: item.designation }, type: QueryTypes.SELECT, transaction },
    );
    if (existing) {
      await JobListLine.update({ quantity: Math.min(existing.quantity + quantity, 9999) }, { where: { id: existing.id }, transaction });
    }
    const line = existing ?? (await JobListLine.create({ listId, partId: null, standardItem: item, requestedNumber: null, standardPartId: null, quantity, notes: notes || null }, { transaction }));
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return { lineId: line.id, partId: null, merged: Boolean(existing), superseded: false };
  });
}

export async function updateLine(userId: string, listId: number, lineId: number, patch: { quantity?: number; notes?: string; standardPartId?: number | null }) {
  await ownList(userId, listId);
  const line = await JobListLine.findOne({ where: { id: lineId, listId } });
  if (!line) throw new AppError("not_found", "That line is not on this list.");
  if (patch.standardPartId) {
    const options = line.partId === null ? [] : ((await equivalentsFor([line.partId])).get(line.partId) ?? []);
    if (!options.some((o) => o.standardPartId === patch.standardPartId)) {
      throw new AppError("validation_failed", "That standard part is not an approved equivalent of this part.", { field: "standardPartId" });
    }
  }
  await line.update({
    ...(patch.quantity !== undefined ? { quantity: patch.quantity } : {}),
    ...(patch.notes !== undefined ? { notes: patch.notes || null } : {}),
    ...(patch.standardPartId !== undefined ? { standardPartId: patch.standardPartId } : {}),
  });
  await JobList.update({ updatedAt: new Date() }, { where: { id: listId } });
}

export async function removeLine(userId: string, listId: number, lineId: number) {
  await ownList(userId, listId);
  const removed = await JobListLine.destroy({ where: { id: lineId, listId } });
  if (removed === 0) throw new AppError("not_found", "That line is not on this list.");
}

/**
 * "Add the rest of the assembly": the other parts fitted in the same place on the same machine as this line's part
 * (the list's machine when it has one), each at the quantity the machine uses, skipping parts already listed.
 */
export async function addRestOfAssembly(userId: string, listId: number, lineId: number) {
  const list = await ownList(userId, listId);
  const line = await JobListLine.findOne({ where: { id: lineId, listId } });
  if (!line) throw new AppError("not_found", "That line is not on this list.");
  if (line.partId === null) throw new AppError("validation_failed", "This line is a standard part sized from measurements; it belongs to no assembly.", { field: "lineId" });
  const usages = await sequelize.query<{ machine_id: number; assembly_id: number; model: string; assembly: string }>(
    `SELECT u.machine_id, u.assembly_id, m.model, a.name AS assembly FROM part_usages u JOIN machines m ON m.id = u.machine_id JOIN assemblies a ON a.id = u.assembly_id
     WHERE u.part_id = :partId ORDER BY (u.machine_id = :machineId) DESC, m.model, a.name`,
    { replacements: { partId: line.partId, machineId: list.machineId ?? 0 }, type: QueryTypes.SELECT },
  );
  const usage = usages[0];
  if (!usage) throw new AppError("validation_failed", "The catalogue does not say where this part is fitted, so it has no assembly to add.", { field: "lineId" });
  const others = await sequelize.query<{ part_id: number; quantity: number }>(
    `SELECT part_id, max(quantity) AS quantity FROM part_usages WHERE machine_id = :machineId AND assembly_id = :assemblyId AND part_id <> :partId AND serial_note IS NULL GROUP BY part_id ORDER BY part_id`,
    { replacements: { machineId: usage.machine_id, assemblyId: usage.assembly_id, partId: line.partId }, type: QueryTypes.SELECT },
  );
  // Work out every line first (reads), then write them all in one transaction: all of the assembly lands, or none.
  const planned = new Map<number, { partId: number; requestedNumber: string | null; quantity: number }>();
  for (const other of others) {
    const latest = (await loadChain(other.part_id)).latestId;
    if (planned.has(latest)) continue;
    const number = latest !== other.part_id ? (await OriginalPart.findByPk(other.part_id, { attributes: ["number"] }))?.number ?? null : null;
    planned.set(latest, { partId: latest, requestedNumber: number, quantity: other.quantity });
  }
  const best = await equivalentsFor([...planned.keys()]);
  const added = await sequelize.transaction(async (transaction) => {
    await lockList(listId, transaction);
    const listed = new Set((await JobListLine.findAll({ where: { listId }, attributes: ["partId"], transaction })).map((l) => l.partId));
    const rows = [...planned.values()]
      .filter((p) => !listed.has(p.partId))
      .map((p) => ({ listId, ...p, standardPartId: best.get(p.partId)?.[0]?.standardPartId ?? null, notes: null }));
    await JobListLine.bulkCreate(rows, { transaction });
    await JobList.update({ updatedAt: new Date() }, { where: { id: listId }, transaction });
    return rows.length;
  });
  return { added, machine: usage.model, assembly: usage.assembly };
}

const mm = (v: number | null) => (v === null ? "" : String(v));

/** One line a part: what to order, by standard designation, with sizes to check it against. */
export function listCsv(view: ListView): string {
  const fields = ["Factory number", "Maker", "Description", "Kind", "Standard designation", "Standard part", "Bore mm", "Outside mm", "Width mm", "Length mm", "Fit", "Quantity", "Notes"];
  const data = view.lines.map((l) => [
    l.partId === null ? "" : l.number,
    l.maker,
    l.description,
    l.categoryName,
    l.chosen?.designation ?? "",
    l.chosen ? STANDARD_KIND_NAMES[l.chosen.kind] : "",
    mm(l.chosen?.innerMm ?? null),
    mm(l.chosen?.outerMm ?? null),
    mm(l.chosen?.widthMm ?? null),
    mm(l.chosen?.lengthMm ?? null),
    l.measured ? "sized from measurements" : l.chosen ? FIT_NAMES[l.chosen.fit].word : "no approved cross",
    l.quantity,
    [l.notes, l.requestedNumber ? `asked for as ${l.requestedNumber}` : null].filter(Boolean).join("; "),
  ]);
  return Papa.unparse({ fields, data }, { newline: "\r\n", escapeFormulae: true });
}

export function csvFileName(view: ListView): string {
  const slug = view.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "job-list";
  return `${slug}.csv`;
}
