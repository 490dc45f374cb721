import { QueryTypes, type Transaction } from "sequelize";
import { Maker, sequelize } from "@/db";
import { classifyRows, type AcceptedRow, type CatalogueNames, type Rejection } from "@/lib/imports/classify";
import { type ImportCounts, type ImportMappingValue, type ImportTarget } from "@/lib/imports/kinds";
import {
  emptyCounts,
  keepName,
  planChunk,
  type KnownCross,
  type KnownPart,
  type KnownState,
  type PlanMemory,
} from "@/lib/imports/plan";
import { streamRows, type FileShape } from "@/lib/imports/read";
import { catalogueWriter, type ChunkWriter } from "@/lib/imports/write";

export type { Rejection } from "@/lib/imports/classify";

/**
 * The one pass over a stored file that both the dry run and the commit make, in named steps for each chunk of rows:
 * 1. read the rows from storage (`streamRows`); 2. classify them against the catalogue's names (`classifyRows`, pure);
 * 3. read what the catalogue holds for them (`readKnown`); 4. plan what each would do (`planChunk`, pure); 5. for a
 * commit, write the plan in the caller's transaction (`ChunkWriter`). The dry run only counts and lists rejections.
 */
export interface PassOptions {
  importId: number;
  userId: string | null;
  target: ImportTarget;
  key: string;
  shape: FileShape;
  mapping: ImportMappingValue;
  /** Absent for a dry run. */
  transaction?: Transaction;
  /** How a commit writes each chunk; the catalogue writer unless given another. */
  writer?: ChunkWriter;
  onRejections?: (rejections: Rejection[]) => Promise<void>;
  onProgress?: (rows: number, bytes: number) => Promise<void>;
}

// Rows a chunk holds: each costs a few round trips (what the catalogue holds, ids, one COPY for each table), so
// larger chunks spend less time waiting on them; 2,500 rows keep the plan of one chunk to a few megabytes.
const CHUNK = 2_500;

type RawRow = { line: number; record: Record<string, string | undefined> };

export async function runPass(options: PassOptions): Promise<ImportCounts> {
  const counts = emptyCounts();
  const names = await readNames(options.transaction);
  const seen = new Map<string, number>();
  const memory: PlanMemory = { makers: new Map(), parts: new Map(), standards: new Map(), nextPlaceholder: -1 };
  let bytesRead = 0;
  let chunk: RawRow[] = [];
  const flush = async () => {
    if (chunk.length === 0) return;
    await passChunk(chunk, { options, names, seen, memory, counts });
    chunk = [];
    await options.onProgress?.(counts.rows, bytesRead);
  };
  for await (const item of streamRows(options.key, options.shape, (bytes) => (bytesRead = bytes))) {
    chunk.push(item);
    if (chunk.length >= CHUNK) await flush();
  }
  await flush();
  return counts;
}

async function passChunk(
  rows: RawRow[],
  state: {
    options: PassOptions;
    names: CatalogueNames;
    seen: Map<string, number>;
    memory: PlanMemory;
    counts: ImportCounts;
  },
): Promise<void> {
  const { options, names, memory, counts } = state;
  const { accepted, rejections } = classifyRows(rows, {
    mapping: options.mapping,
    target: options.target,
    names,
    memory: { seen: state.seen },
  });
  const known = await readKnown(accepted, options.transaction);
  const plan = planChunk(accepted, {
    target: options.target,
    userId: options.userId,
    mapping: options.mapping,
    known,
    memory,
  });
  if (options.transaction) {
    const writer = options.writer ?? catalogueWriter;
    await writer.write(plan, {
      importId: options.importId,
      userId: options.userId,
      transaction: options.transaction,
      memory,
      names,
    });
  }
  addCounts(counts, plan.counts, rows.length);
  const refused = [...rejections, ...plan.rejections].sort((a, b) => a.line - b.line);
  counts.rejected += refused.length;
  if (refused.length > 0) await options.onRejections?.(refused);
}

function addCounts(total: ImportCounts, chunk: ImportCounts, rows: number): void {
  total.rows += rows;
  for (const key of ["newParts", "newCrosses", "updates", "unchanged", "newMakers", "newStandardParts"] as const)
    total[key] += chunk[key];
  for (const key of ["newMakerNames", "newStandardPartNames"] as const) {
    for (const name of chunk[key] ?? []) keepName(total[key], name);
  }
}

/** Step 1b: the makers, machines and places rows are resolved against. */
async function readNames(transaction?: Transaction): Promise<CatalogueNames> {
  const t = { transaction };
  const makers = new Map(
    (await Maker.findAll({ attributes: ["id", "name", "prefixes"], ...t })).map((m) => [
      m.name.toLowerCase(),
      { id: m.id, name: m.name, prefixes: m.prefixes },
    ]),
  );
  const machineRows = await sequelize.query<{ id: number; maker_id: number; model: string }>(
    "SELECT id, maker_id, model FROM machines",
    { type: QueryTypes.SELECT, ...t },
  );
  const assemblyRows = await sequelize.query<{ id: number; name: string }>("SELECT id, name FROM assemblies", {
    type: QueryTypes.SELECT,
    ...t,
  });
  return {
    makers,
    machines: new Map(machineRows.map((m) => [`${m.maker_id}|${m.model.toLowerCase()}`, m.id])),
    assemblies: new Map(assemblyRows.map((a) => [a.name.toLowerCase(), a.id])),
  };
}

/** Step 3: what the catalogue already holds for a chunk's rows (parts, standard parts, crosses), in three queries. */
async function readKnown(accepted: AcceptedRow[], transaction?: Transaction): Promise<KnownState> {
  const t = { type: QueryTypes.SELECT, transaction } as const;
  const withMaker = accepted.filter((a) => a.maker);
  const parts = withMaker.length
    ? await sequelize.query<KnownPart>(
        `SELECT p.id, p.maker_id, p.number_normalised, p.description, p.category,
                p.inner_mm, p.outer_mm, p.width_mm, p.length_mm
         FROM original_parts p JOIN unnest(ARRAY[:makerIds]::int[], ARRAY[:numbers]::text[]) AS k(maker_id, number)
           ON p.maker_id = k.maker_id AND p.number_normalised = k.number`,
        {
          replacements: { makerIds: withMaker.map((a) => a.maker!.id), numbers: withMaker.map((a) => a.normalised) },
          ...t,
        },
      )
    : [];
  const partByKey = new Map(parts.map((p) => [`${p.maker_id}|${p.number_normalised}`, p]));
  const standards = accepted.length
    ? await sequelize.query<{ id: number; kind: string; designation: string }>(
        `SELECT s.id, s.kind, s.designation FROM standard_parts s
         JOIN unnest(ARRAY[:kinds]::text[], ARRAY[:designations]::text[]) AS k(kind, designation)
           ON s.kind::text = k.kind AND upper(s.designation) = k.designation`,
        {
          replacements: {
            kinds: accepted.map((a) => a.row.standard.kind),
            designations: accepted.map((a) => a.row.standard.designation.toUpperCase()),
          },
          ...t,
        },
      )
    : [];
  const standardByKey = new Map(standards.map((s) => [`${s.kind}|${s.designation.toUpperCase()}`, s.id]));
  const pairs = accepted.flatMap((a) => {
    const partId = a.maker ? partByKey.get(`${a.maker.id}|${a.normalised}`)?.id : undefined;
    const standardId = standardByKey.get(`${a.row.standard.kind}|${a.row.standard.designation.toUpperCase()}`);
    return partId !== undefined && standardId !== undefined ? [[partId, standardId] as const] : [];
  });
  const crosses = pairs.length
    ? await sequelize.query<KnownCross>(
        `SELECT c.id, c.original_part_id, c.standard_part_id, c.fit, c.notes, c.status FROM crosses c
         JOIN unnest(ARRAY[:partIds]::int[], ARRAY[:standardIds]::int[]) AS k(part_id, standard_id)
           ON c.original_part_id = k.part_id AND c.standard_part_id = k.standard_id
         ORDER BY (c.status = 'approved') DESC, c.id`,
        { replacements: { partIds: pairs.map((p) => p[0]), standardIds: pairs.map((p) => p[1]) }, ...t },
      )
    : [];
  const crossByPair = new Map<string, KnownCross>();
  for (const c of crosses)
    if (!crossByPair.has(`${c.original_part_id}|${c.standard_part_id}`))
      crossByPair.set(`${c.original_part_id}|${c.standard_part_id}`, c);
  return { partByKey, standardByKey, crossByPair };
}
