import { searchForms } from "@/lib/catalogue/normalise";
import type { ImportMappingValue, ImportTarget } from "@/lib/imports/kinds";
import { parseImportRow, type ParsedRow, type RowProblem } from "@/lib/imports/rows";

/** A row the import refuses, with the line it stood on and the cells as they were. */
export interface Rejection extends RowProblem {
  line: number;
  raw: Record<string, string | undefined>;
}

export interface MakerInfo {
  id: number;
  name: string;
  prefixes: string[];
}

/** The names rows are resolved against: makers by lower-case name, machines by maker and model, places by name. */
export interface CatalogueNames {
  makers: Map<string, MakerInfo>;
  machines: Map<string, number>;
  assemblies: Map<string, number>;
}

/** A row that reads well and names what the catalogue knows (or a maker it will add). */
export interface AcceptedRow {
  line: number;
  raw: Record<string, string | undefined>;
  row: ParsedRow;
  makerKey: string;
  /** Null for a maker the catalogue does not have yet: the import adds it (catalogue imports only). */
  maker: MakerInfo | null;
  normalised: string;
  numberKey: string;
  machineId: number | null;
  assemblyId: number | null;
}

/** What the pass remembers from one chunk to the next: the rows seen (for repeats within the file). */
export interface ClassifyMemory {
  seen: Map<string, number>;
}

type RawRow = { line: number; record: Record<string, string | undefined> };

/**
 * Step 2 of the pass, pure: each row read, checked and resolved against the catalogue's names, or rejected with its
 * column and reason. No database: the names come in, the accepted rows and the rejections go out.
 */
export function classifyRows(
  rows: RawRow[],
  options: { mapping: ImportMappingValue; target: ImportTarget; names: CatalogueNames; memory: ClassifyMemory },
): { accepted: AcceptedRow[]; rejections: Rejection[] } {
  const accepted: AcceptedRow[] = [];
  const rejections: Rejection[] = [];
  for (const { line, record } of rows) {
    const result = classifyRow(record, line, options);
    if ("problem" in result) rejections.push({ line, raw: record, ...result.problem });
    else {
      options.memory.seen.set(result.dupKey, line);
      accepted.push(result.accepted);
    }
  }
  return { accepted, rejections };
}

function classifyRow(
  record: Record<string, string | undefined>,
  line: number,
  {
    mapping,
    target,
    names,
    memory,
  }: { mapping: ImportMappingValue; target: ImportTarget; names: CatalogueNames; memory: ClassifyMemory },
): { accepted: AcceptedRow; dupKey: string } | { problem: RowProblem } {
  const parsed = parseImportRow(record, mapping);
  if (!parsed.ok) return { problem: parsed.problem };
  const row = parsed.row;
  const makerKey = row.maker.toLowerCase();
  const maker = names.makers.get(makerKey) ?? null;
  if (!maker && target === "review_queue") {
    const reason = `Unknown maker "${row.maker}". Proposals can only name makers already in the catalogue.`;
    return { problem: { column: mapping.maker ?? null, reason } };
  }
  const forms = searchForms(row.number, maker?.prefixes ?? []);
  if (!forms.normalised) {
    return { problem: { column: mapping.number ?? null, reason: "The factory number has no letter or digit." } };
  }
  const dupKey = `${makerKey}|${forms.normalised}|${row.standard.kind}|${row.standard.designation.toUpperCase()}`;
  const first = memory.seen.get(dupKey);
  if (first !== undefined) {
    const reason = `Duplicate within the file: line ${first} gives the same part and standard part.`;
    return { problem: { column: mapping.designation ?? null, reason } };
  }
  const place = resolvePlace(row, maker, mapping, names);
  if ("problem" in place) return place;
  const accepted = {
    line,
    raw: record,
    row,
    makerKey,
    maker,
    normalised: forms.normalised,
    numberKey: forms.key,
    ...place,
  };
  return { accepted, dupKey };
}

/** The machine and the place on it a row names, if it names them; both must be known to the catalogue. */
function resolvePlace(
  row: ParsedRow,
  maker: MakerInfo | null,
  mapping: ImportMappingValue,
  names: CatalogueNames,
): { machineId: number | null; assemblyId: number | null } | { problem: RowProblem } {
  let machineId: number | null = null;
  let assemblyId: number | null = null;
  if (row.machine) {
    machineId = maker ? (names.machines.get(`${maker.id}|${row.machine.toLowerCase()}`) ?? null) : null;
    if (!machineId) {
      const reason = `Unknown machine "${row.machine}" for ${row.maker}. Leave it empty or add the machine first.`;
      return { problem: { column: mapping.machine ?? null, reason } };
    }
    if (!row.assembly) {
      const reason = "A machine is given but not where on it the part sits.";
      return { problem: { column: mapping.assembly ?? mapping.machine ?? null, reason } };
    }
  }
  if (row.assembly) {
    assemblyId = names.assemblies.get(row.assembly.toLowerCase()) ?? null;
    if (!assemblyId) {
      const places = [...names.assemblies.keys()].join(", ");
      const reason = `Unknown place on the machine "${row.assembly}". Use one of: ${places}.`;
      return { problem: { column: mapping.assembly ?? null, reason } };
    }
  }
  return { machineId, assemblyId };
}
