import { QueryTypes, type CreationAttributes, type Transaction } from "sequelize";
import { Cross, Maker, OriginalPart, PartUsage, sequelize, StandardPart, Proposal } from "@/db";
import { STANDARD_KIND_NAMES, type PartCategory } from "@/lib/catalogue/kinds";
import { searchForms } from "@/lib/catalogue/normalise";
import type { Measurement } from "@/lib/proposals/kinds";
import { NAMES_KEPT, type ImportCounts, type ImportMappingValue, type ImportTarget } from "@/lib/imports/kinds";
import { streamRows, type FileShape } from "@/lib/imports/read";
import { parseImportRow, type ParsedRow, type RowProblem } from "@/lib/imports/rows";

// The one pass over a stored file that both the dry run and the commit make: every row is read, checked and
// classified against the catalogue as it stands. The dry run only counts and lists rejections; the commit, inside
// the caller's transaction, writes each accepted row and records what it wrote for a later rollback.

export interface Rejection extends RowProblem {
  line: number;
  raw: Record<string, string | undefined>;
}

export interface PassOptions {
  importId: number;
  userId: string | null;
  target: ImportTarget;
  key: string;
  shape: FileShape;
  mapping: ImportMappingValue;
  /** Absent for a dry run. */
  transaction?: Transaction;
  onRejections?: (rejections: Rejection[]) => Promise<void>;
  onProgress?: (rows: number, bytes: number) => Promise<void>;
  /** Tests only: throw after this many rows, to show that a failed commit leaves nothing behind. */
  failAfterRows?: number;
}

const CHUNK = 500;
const SAME = 0.001;

const CATEGORY_FOR_KIND: Partial<Record<string, PartCategory>> = {
  bearing: "bearing",
  lip_seal: "lip_seal",
  v_belt: "v_belt",
  key: "key",
  plug: "plug",
  felt: "felt_seal",
  gasket_sheet: "gasket",
};

interface MakerInfo {
  id: number;
  name: string;
  prefixes: string[];
}

interface PartRow {
  id: number;
  maker_id: number;
  number_normalized: string;
  description: string;
  category: PartCategory;
  inner_mm: number | null;
  outer_mm: number | null;
  width_mm: number | null;
  length_mm: number | null;
}

interface CrossRow {
  id: number;
  original_part_id: number;
  standard_part_id: number;
  fit: string;
  notes: string | null;
  status: string;
}

interface Change {
  importId: number;
  line: number;
  tableName: string;
  recordId: number;
  action: "insert" | "update";
  before: Record<string, unknown> | null;
}

const emptyCounts = (): ImportCounts => ({
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
const keepName = (names: string[] | undefined, name: string) => {
  if (names && names.length < NAMES_KEPT && !names.includes(name)) names.push(name);
};

export async function runPass(options: PassOptions): Promise<ImportCounts> {
  const { transaction, target } = options;
  const commit = Boolean(transaction);
  const counts = emptyCounts();
  const t = { transaction };

  const makers = new Map<string, MakerInfo>();
  for (const m of await Maker.findAll({ attributes: ["id", "name", "prefixes"], ...t }))
    makers.set(m.name.toLowerCase(), { id: m.id, name: m.name, prefixes: m.prefixes });
  const plannedMakers = new Set<string>();
  const machines = new Map<string, number>();
  for (const m of await sequelize.query<{ id: number; maker_id: number; model: string }>(
    "SELECT id, maker_id, model FROM machines",
    { type: QueryTypes.SELECT, ...t },
  )) {
    machines.set(`${m.maker_id}|${m.model.toLowerCase()}`, m.id);
  }
  const assemblies = new Map<string, number>();
  for (const a of await sequelize.query<{ id: number; name: string }>("SELECT id, name FROM assemblies", {
    type: QueryTypes.SELECT,
    ...t,
  }))
    assemblies.set(a.name.toLowerCase(), a.id);

  const seen = new Map<string, number>();
  // Parts and standard parts that an earlier row of this file creates: later rows use them, and count them once.
  const plannedParts = new Map<string, number>();
  const plannedStandards = new Map<string, number>();
  let fakeId = -1;

  let bytesRead = 0;
  let chunk: Array<{ line: number; record: Record<string, string | undefined> }> = [];

  const flush = async () => {
    if (chunk.length === 0) return;
    const rows = chunk;
    chunk = [];
    counts.rows += rows.length;
    const rejections: Rejection[] = [];
    const reject = (line: number, raw: Record<string, string | undefined>, problem: RowProblem) =>
      rejections.push({ line, raw, ...problem });
    const changes: Change[] = [];

    // 1. Read each row; resolve maker, machine and place; refuse repeats within the file.
    interface Accepted {
      line: number;
      raw: Record<string, string | undefined>;
      row: ParsedRow;
      makerKey: string;
      maker: MakerInfo | null;
      normalised: string;
      numberKey: string;
      machineId: number | null;
      assemblyId: number | null;
    }
    const accepted: Accepted[] = [];
    for (const { line, record } of rows) {
      const parsed = parseImportRow(record, options.mapping);
      if (!parsed.ok) {
        reject(line, record, parsed.problem);
        continue;
      }
      const row = parsed.row;
      const makerKey = row.maker.toLowerCase();
      let maker = makers.get(makerKey) ?? null;
      if (!maker && target === "review_queue") {
        reject(line, record, {
          column: options.mapping.maker ?? null,
          reason: `Unknown maker "${row.maker}". Proposals can only name makers already in the catalogue.`,
        });
        continue;
      }
      if (!maker && commit) {
        const created = await Maker.create({ name: row.maker, prefixes: [], country: null, note: null }, t);
        maker = { id: created.id, name: created.name, prefixes: [] };
        makers.set(makerKey, maker);
        changes.push({
          importId: options.importId,
          line,
          tableName: "makers",
          recordId: created.id,
          action: "insert",
          before: null,
        });
        counts.newMakers += 1;
        keepName(counts.newMakerNames, row.maker);
      } else if (!maker && !plannedMakers.has(makerKey)) {
        plannedMakers.add(makerKey);
        counts.newMakers += 1;
        keepName(counts.newMakerNames, row.maker);
      }
      const forms = searchForms(row.number, maker?.prefixes ?? []);
      if (!forms.normalised) {
        reject(line, record, {
          column: options.mapping.number ?? null,
          reason: "The factory number has no letter or digit.",
        });
        continue;
      }
      const dupKey = `${makerKey}|${forms.normalised}|${row.standard.kind}|${row.standard.designation.toUpperCase()}`;
      const first = seen.get(dupKey);
      if (first !== undefined) {
        reject(line, record, {
          column: options.mapping.designation ?? null,
          reason: `Duplicate within the file: line ${first} gives the same part and standard part.`,
        });
        continue;
      }
      let machineId: number | null = null;
      let assemblyId: number | null = null;
      if (row.machine) {
        machineId = maker ? (machines.get(`${maker.id}|${row.machine.toLowerCase()}`) ?? null) : null;
        if (!machineId) {
          reject(line, record, {
            column: options.mapping.machine ?? null,
            reason: `Unknown machine "${row.machine}" for ${row.maker}. Leave it empty or add the machine first.`,
          });
          continue;
        }
        if (!row.assembly) {
          reject(line, record, {
            column: options.mapping.assembly ?? options.mapping.machine ?? null,
            reason: "A machine is given but not where on it the part sits.",
          });
          continue;
        }
      }
      if (row.assembly) {
        assemblyId = assemblies.get(row.assembly.toLowerCase()) ?? null;
        if (!assemblyId) {
          reject(line, record, {
            column: options.mapping.assembly ?? null,
            reason: `Unknown place on the machine "${row.assembly}". Use one of: ${[...assemblies.keys()].join(", ")}.`,
          });
          continue;
        }
      }
      seen.set(dupKey, line);
      accepted.push({
        line,
        raw: record,
        row,
        makerKey,
        maker,
        normalised: forms.normalised,
        numberKey: forms.key,
        machineId,
        assemblyId,
      });
    }

    // 2. What the catalogue already holds for these rows, in three queries.
    const known = accepted.filter((a) => a.maker);
    const parts = known.length
      ? await sequelize.query<PartRow>(
          `SELECT p.id, p.maker_id, p.number_normalized, p.description, p.category, p.inner_mm, p.outer_mm, p.width_mm,
            p.length_mm
           FROM original_parts p JOIN unnest(ARRAY[:makerIds]::int[], ARRAY[:numbers]::text[]) AS k(maker_id, number)
             ON p.maker_id = k.maker_id AND p.number_normalized = k.number`,
          {
            replacements: { makerIds: known.map((a) => a.maker!.id), numbers: known.map((a) => a.normalised) },
            type: QueryTypes.SELECT,
            ...t,
          },
        )
      : [];
    const partByKey = new Map(parts.map((p) => [`${p.maker_id}|${p.number_normalized}`, p]));
    const standards = await sequelize.query<{ id: number; kind: string; designation: string }>(
      `SELECT s.id, s.kind, s.designation FROM standard_parts s
       JOIN unnest(ARRAY[:kinds]::text[], ARRAY[:designations]::text[]) AS k(kind, designation) ON s.kind::text =
         k.kind AND upper(s.designation) = k.designation`,
      {
        replacements: {
          kinds: accepted.length ? accepted.map((a) => a.row.standard.kind) : [""],
          designations: accepted.length ? accepted.map((a) => a.row.standard.designation.toUpperCase()) : [""],
        },
        type: QueryTypes.SELECT,
        ...t,
      },
    );
    const standardByKey = new Map(standards.map((s) => [`${s.kind}|${s.designation.toUpperCase()}`, s.id]));
    const pairs = accepted
      .map(
        (a) =>
          [
            a.maker ? partByKey.get(`${a.maker.id}|${a.normalised}`)?.id : undefined,
            standardByKey.get(`${a.row.standard.kind}|${a.row.standard.designation.toUpperCase()}`),
          ] as const,
      )
      .filter((p): p is readonly [number, number] => p[0] !== undefined && p[1] !== undefined);
    const crosses = pairs.length
      ? await sequelize.query<CrossRow>(
          `SELECT c.id, c.original_part_id, c.standard_part_id, c.fit, c.notes, c.status FROM crosses c
           JOIN unnest(ARRAY[:partIds]::int[], ARRAY[:standardIds]::int[]) AS k(part_id, standard_id) ON
             c.original_part_id = k.part_id AND c.standard_part_id = k.standard_id
           ORDER BY (c.status = 'approved') DESC, c.id`,
          {
            replacements: { partIds: pairs.map((p) => p[0]), standardIds: pairs.map((p) => p[1]) },
            type: QueryTypes.SELECT,
            ...t,
          },
        )
      : [];
    const crossByPair = new Map<string, CrossRow>();
    for (const c of crosses)
      if (!crossByPair.has(`${c.original_part_id}|${c.standard_part_id}`))
        crossByPair.set(`${c.original_part_id}|${c.standard_part_id}`, c);

    // 3. Decide each row, writing it when committing.
    const newCrossRows: Array<{ line: number; values: CreationAttributes<Cross> }> = [];
    const newPartRows: Array<{
      placeholder: number;
      key: string;
      line: number;
      values: CreationAttributes<OriginalPart>;
      usage: { machineId: number; assemblyId: number } | null;
    }> = [];
    const newProposalRows: Array<{ line: number; values: CreationAttributes<Proposal> }> = [];
    for (const a of accepted) {
      const { row } = a;
      const partKey = `${a.makerKey}|${a.normalised}`;
      const existingPart = a.maker ? partByKey.get(`${a.maker.id}|${a.normalised}`) : undefined;
      let partId: number | undefined = existingPart?.id ?? plannedParts.get(partKey);
      let partChanged = false;

      if (existingPart) {
        const diff: Record<string, unknown> = {};
        if (row.description && row.description !== existingPart.description) diff.description = row.description;
        if (row.category && row.category !== existingPart.category) diff.category = row.category;
        for (const [field, column] of [
          ["innerMm", "inner_mm"],
          ["outerMm", "outer_mm"],
          ["widthMm", "width_mm"],
          ["lengthMm", "length_mm"],
        ] as const) {
          const given = row[field];
          if (given !== null && (existingPart[column] === null || Math.abs(existingPart[column]! - given) > SAME))
            diff[field] = given;
        }
        if (Object.keys(diff).length > 0 && target === "catalogue") {
          partChanged = true;
          if (commit) {
            const before = {
              description: existingPart.description,
              category: existingPart.category,
              innerMm: existingPart.inner_mm,
              outerMm: existingPart.outer_mm,
              widthMm: existingPart.width_mm,
              lengthMm: existingPart.length_mm,
            };
            await OriginalPart.update(diff, { where: { id: existingPart.id }, ...t });
            changes.push({
              importId: options.importId,
              line: a.line,
              tableName: "original_parts",
              recordId: existingPart.id,
              action: "update",
              before,
            });
            Object.assign(existingPart, {
              description: diff.description ?? existingPart.description,
              category: diff.category ?? existingPart.category,
            });
          }
        }
      } else if (partId === undefined) {
        const category = row.category ?? CATEGORY_FOR_KIND[row.standard.kind] ?? null;
        if (!row.description) {
          reject(a.line, a.raw, {
            column: options.mapping.description ?? null,
            reason: "The part is new to the catalogue, so it needs a description.",
          });
          continue;
        }
        if (!category) {
          reject(a.line, a.raw, {
            column: options.mapping.category ?? null,
            reason: "The part is new to the catalogue, so it needs its kind (category).",
          });
          continue;
        }
        if (target === "catalogue") {
          counts.newParts += 1;
          // Placeholders now; the chunk's new parts are inserted together below and the real ids put in.
          partId = fakeId--;
          if (commit) {
            newPartRows.push({
              placeholder: partId,
              key: partKey,
              line: a.line,
              values: {
                makerId: a.maker!.id,
                number: row.number.toUpperCase(),
                numberNormalized: a.normalised,
                numberKey: a.numberKey,
                description: row.description,
                category,
                innerMm: row.innerMm,
                outerMm: row.outerMm,
                widthMm: row.widthMm,
                lengthMm: row.lengthMm,
                dimensionsNote: null,
              },
              usage: a.machineId && a.assemblyId ? { machineId: a.machineId, assemblyId: a.assemblyId } : null,
            });
          }
          plannedParts.set(partKey, partId);
        }
      }

      const standardKey = `${row.standard.kind}|${row.standard.designation.toUpperCase()}`;
      let standardId = standardByKey.get(standardKey) ?? plannedStandards.get(standardKey);
      if (standardId === undefined && target === "catalogue") {
        counts.newStandardParts += 1;
        keepName(counts.newStandardPartNames, `${STANDARD_KIND_NAMES[row.standard.kind]} ${row.standard.designation}`);
        if (commit) {
          const s = row.standard;
          const created = await StandardPart.create(
            {
              kind: s.kind,
              designation: s.designation,
              innerMm: s.innerMm,
              outerMm: s.outerMm,
              widthMm: s.widthMm,
              lengthMm: s.lengthMm,
              attributes: s.attributes,
            },
            t,
          );
          standardId = created.id;
          changes.push({
            importId: options.importId,
            line: a.line,
            tableName: "standard_parts",
            recordId: created.id,
            action: "insert",
            before: null,
          });
        } else {
          standardId = fakeId--;
        }
        plannedStandards.set(standardKey, standardId);
      }

      const existingCross =
        partId !== undefined && standardId !== undefined ? crossByPair.get(`${partId}|${standardId}`) : undefined;
      if (target === "review_queue") {
        if (existingCross?.status === "approved") {
          counts.unchanged += 1;
          continue;
        }
        counts.newCrosses += 1;
        if (commit) {
          const s = row.standard;
          const measurements: Measurement[] = (["innerMm", "outerMm", "widthMm", "lengthMm"] as const)
            .filter((k) => row[k] !== null)
            .map((k) => ({
              dimension: ({ innerMm: "inner", outerMm: "outer", widthMm: "width", lengthMm: "length" } as const)[k],
              value: row[k]!,
              unit: "mm",
            }));
          newProposalRows.push({
            line: a.line,
            values: {
              userId: options.userId!,
              originalPartId: partId ?? null,
              newPart:
                partId === undefined
                  ? {
                      makerId: a.maker!.id,
                      number: row.number.toUpperCase(),
                      description: row.description!,
                      category: (row.category ?? CATEGORY_FOR_KIND[s.kind])!,
                      machineId: a.machineId,
                      assemblyId: a.assemblyId,
                      numberNormalized: a.normalised,
                    }
                  : null,
              standardPartId: standardId ?? null,
              newStandard:
                standardId === undefined
                  ? ({
                      kind: s.kind,
                      designation: s.designation,
                      innerMm: s.innerMm,
                      outerMm: s.outerMm,
                      widthMm: s.widthMm,
                      lengthMm: s.lengthMm,
                      attributes: s.attributes,
                    } as never)
                  : null,
              fit: row.fit,
              measurements,
              notes: row.notes,
              checks: [],
            },
          });
        }
        continue;
      }

      if (existingCross) {
        const diff: Record<string, unknown> = {};
        if (row.fitGiven && row.fit !== existingCross.fit) diff.fit = row.fit;
        if (row.notes && row.notes !== existingCross.notes) diff.notes = row.notes;
        if (existingCross.status !== "approved") diff.status = "approved";
        if (Object.keys(diff).length > 0) {
          if (commit) {
            await Cross.update(diff, { where: { id: existingCross.id }, ...t });
            changes.push({
              importId: options.importId,
              line: a.line,
              tableName: "crosses",
              recordId: existingCross.id,
              action: "update",
              before: { fit: existingCross.fit, notes: existingCross.notes, status: existingCross.status },
            });
            Object.assign(existingCross, diff);
          }
          counts.updates += 1;
        } else if (partChanged) {
          counts.updates += 1;
        } else {
          counts.unchanged += 1;
        }
        continue;
      }

      counts.newCrosses += 1;
      if (commit) {
        newCrossRows.push({
          line: a.line,
          values: {
            originalPartId: partId!,
            standardPartId: standardId!,
            repairMethod: null,
            fit: row.fit,
            notes: row.notes,
            status: "approved",
            origin: "import",
            createdBy: options.userId,
          },
        });
      }
    }

    if (commit && newPartRows.length > 0) {
      const created = await OriginalPart.bulkCreate(
        newPartRows.map((r) => r.values),
        { ...t, returning: true },
      );
      const realId = new Map<number, number>();
      created.forEach((part, i) => {
        const planned = newPartRows[i];
        realId.set(planned.placeholder, part.id);
        plannedParts.set(planned.key, part.id);
        changes.push({
          importId: options.importId,
          line: planned.line,
          tableName: "original_parts",
          recordId: part.id,
          action: "insert",
          before: null,
        });
      });
      const usages = newPartRows
        .filter((r) => r.usage)
        .map((r) => ({
          line: r.line,
          values: { partId: realId.get(r.placeholder)!, ...r.usage!, quantity: 1, serialNote: null },
        }));
      if (usages.length > 0) {
        const createdUsages = await PartUsage.bulkCreate(
          usages.map((u) => u.values),
          { ...t, returning: true },
        );
        createdUsages.forEach((u, i) =>
          changes.push({
            importId: options.importId,
            line: usages[i].line,
            tableName: "part_usages",
            recordId: u.id,
            action: "insert",
            before: null,
          }),
        );
      }
      for (const row of newCrossRows)
        if (row.values.originalPartId < 0) row.values.originalPartId = realId.get(row.values.originalPartId)!;
    }
    if (commit && newCrossRows.length > 0) {
      const created = await Cross.bulkCreate(
        newCrossRows.map((r) => r.values),
        { ...t, returning: true },
      );
      created.forEach((c, i) =>
        changes.push({
          importId: options.importId,
          line: newCrossRows[i].line,
          tableName: "crosses",
          recordId: c.id,
          action: "insert",
          before: null,
        }),
      );
    }
    if (commit && newProposalRows.length > 0) {
      const created = await Proposal.bulkCreate(
        newProposalRows.map((r) => r.values),
        { ...t, returning: true },
      );
      created.forEach((s, i) =>
        changes.push({
          importId: options.importId,
          line: newProposalRows[i].line,
          tableName: "proposals",
          recordId: s.id,
          action: "insert",
          before: null,
        }),
      );
    }
    if (commit && changes.length > 0) {
      await sequelize.getQueryInterface().bulkInsert(
        "import_changes",
        changes.map((c) => ({
          import_id: c.importId,
          line: c.line,
          table_name: c.tableName,
          record_id: c.recordId,
          action: c.action,
          before: c.before ? JSON.stringify(c.before) : null,
        })),
        t,
      );
    }
    counts.rejected += rejections.length;
    if (rejections.length > 0) await options.onRejections?.(rejections);
    const done = counts.rows;
    await options.onProgress?.(done, bytesRead);
    if (options.failAfterRows !== undefined && done >= options.failAfterRows)
      throw new Error(`Forced failure after ${done} rows`);
  };

  for await (const item of streamRows(options.key, options.shape, (bytes) => (bytesRead = bytes))) {
    chunk.push(item);
    if (chunk.length >= CHUNK) await flush();
  }
  await flush();
  return counts;
}
