import {
  CATEGORY_NAMES,
  FITS,
  PART_CATEGORIES,
  STANDARD_KIND_NAMES,
  STANDARD_KINDS,
  type Fit,
  type PartCategory,
  type StandardKind,
} from "@/lib/catalogue/kinds";
import { checkStandard } from "@/lib/proposals/checks";
import type { ImportField, ImportMappingValue } from "@/lib/imports/kinds";
import { StandardsInputError } from "@/lib/standards/errors";
import { parseLength } from "@/lib/standards/units";

export interface ParsedRow {
  maker: string;
  number: string;
  description: string | null;
  category: PartCategory | null;
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
  standard: {
    kind: StandardKind;
    designation: string;
    innerMm: number | null;
    outerMm: number | null;
    widthMm: number | null;
    lengthMm: number | null;
    attributes: Record<string, unknown>;
  };
  fit: Fit;
  fitGiven: boolean;
  notes: string | null;
  machine: string | null;
  assembly: string | null;
}

export interface RowProblem {
  column: string | null;
  reason: string;
}

export type RowResult = { ok: true; row: ParsedRow } | { ok: false; problem: RowProblem };

const squash = (v: string) =>
  v
    .normalize("NFKC")
    .toLowerCase()
    .replace(/[\s\-_.]+/g, "");

const CATEGORY_WORDS = new Map<string, PartCategory>();
for (const c of PART_CATEGORIES) {
  CATEGORY_WORDS.set(squash(c), c);
  CATEGORY_WORDS.set(squash(CATEGORY_NAMES[c]), c);
}
for (const [word, c] of [
  ["ballbearing", "bearing"],
  ["bearings", "bearing"],
  ["oilseal", "lip_seal"],
  ["shaftseal", "lip_seal"],
  ["seal", "lip_seal"],
  ["felt", "felt_seal"],
  ["belt", "v_belt"],
  ["vbelt", "v_belt"],
  ["fanbelt", "v_belt"],
  ["woodruffkey", "key"],
  ["glandpacking", "packing"],
  ["packing", "packing"],
  ["cupplug", "plug"],
  ["coreplug", "plug"],
  ["expansionplug", "plug"],
  ["taperpin", "pin"],
  ["dowel", "pin"],
  ["bolt", "fastener"],
  ["stud", "fastener"],
  ["nut", "fastener"],
  ["greasefitting", "grease_fitting"],
  ["greasenipple", "grease_fitting"],
  ["rollerchain", "chain"],
] as const) {
  CATEGORY_WORDS.set(word, c);
}

const KIND_WORDS = new Map<string, StandardKind>();
for (const k of STANDARD_KINDS) {
  KIND_WORDS.set(squash(k), k);
  KIND_WORDS.set(squash(STANDARD_KIND_NAMES[k]), k);
}

/** The standard part a category is usually replaced by, when the file does not say. */
const KIND_FOR_CATEGORY: Record<PartCategory, StandardKind | null> = {
  bearing: "bearing",
  lip_seal: "lip_seal",
  felt_seal: "felt",
  v_belt: "v_belt",
  key: "key",
  gasket: "gasket_sheet",
  plug: "plug",
  other: null,
  packing: "packing",
  pin: "pin",
  fastener: "thread",
  grease_fitting: "grease_fitting",
  chain: "chain",
};

const FIT_WORDS = new Map<string, Fit>([
  ...FITS.map((f) => [squash(f), f] as [string, Fit]),
  ["direct", "direct"],
  ["yes", "direct"],
  ["withmodification", "with_modification"],
  ["modified", "with_modification"],
  ["modification", "with_modification"],
  ["mod", "with_modification"],
  ["dimensionsonly", "dimensions_only"],
  ["sizeonly", "dimensions_only"],
  ["dimensions", "dimensions_only"],
]);

const DIMENSION_WORDS: Record<"innerMm" | "outerMm" | "widthMm" | "lengthMm", string> = {
  innerMm: "bore",
  outerMm: "outside diameter",
  widthMm: "width",
  lengthMm: "length",
};

/** The first problem found in a row, with the field whose column it is in. */
class RowFailure {
  constructor(
    readonly field: ImportField | null,
    readonly reason: string,
  ) {}
}

type Cell = (field: ImportField) => string;
type Dims = Record<"innerMm" | "outerMm" | "widthMm" | "lengthMm", number | null>;

/**
 * Reads one spreadsheet row through the column mapping. The first problem found is returned with the column it is
 * in, so that the rejected-rows list can say exactly where to look.
 */
export function parseImportRow(record: Record<string, string | undefined>, mapping: ImportMappingValue): RowResult {
  const text: Cell = (field) => {
    const c = mapping[field];
    return c ? (record[c] ?? "").trim() : "";
  };
  try {
    return { ok: true, row: readRow(text) };
  } catch (error) {
    if (!(error instanceof RowFailure)) throw error;
    return {
      ok: false,
      problem: { column: error.field ? (mapping[error.field] ?? null) : null, reason: error.reason },
    };
  }
}

function readRow(text: Cell): ParsedRow {
  const maker = required(text, "maker", "The maker is empty.", 120, "The maker's name is longer than 120 characters.");
  const number = required(
    text,
    "number",
    "The factory number is empty.",
    60,
    "The factory number is longer than 60 characters.",
  );
  if (!/[A-Za-z0-9]/.test(number)) throw new RowFailure("number", "The factory number has no letter or digit.");
  const category = readCategory(text);
  const dims = readDims(text);
  const standard = readStandard(text, category, dims);
  const fitText = text("fit");
  const fit = readFit(fitText);
  const notes = optional(text, "notes", 2000, "The notes are longer than 2000 characters.");
  const description = optional(text, "description", 200, "The description is longer than 200 characters.");
  return {
    maker,
    number,
    description,
    category,
    ...dims,
    standard,
    fit,
    fitGiven: Boolean(fitText),
    notes,
    machine: text("machine") || null,
    assembly: text("assembly") || null,
  };
}

function required(text: Cell, field: ImportField, empty: string, max: number, long: string): string {
  const value = text(field);
  if (!value) throw new RowFailure(field, empty);
  if (value.length > max) throw new RowFailure(field, long);
  return value;
}

function optional(text: Cell, field: ImportField, max: number, long: string): string | null {
  const value = text(field);
  if (value.length > max) throw new RowFailure(field, long);
  return value || null;
}

function readCategory(text: Cell): PartCategory | null {
  const categoryText = text("category");
  if (!categoryText) return null;
  const category = CATEGORY_WORDS.get(squash(categoryText));
  if (!category)
    throw new RowFailure("category", `Unknown category "${categoryText}". Use one of: ${PART_CATEGORIES.join(", ")}.`);
  return category;
}

function readDims(text: Cell): Dims {
  const dims: Dims = { innerMm: null, outerMm: null, widthMm: null, lengthMm: null };
  for (const key of ["innerMm", "outerMm", "widthMm", "lengthMm"] as const) {
    const value = text(key);
    if (!value) continue;
    try {
      dims[key] = Math.round(parseLength(value, "mm").mm * 1000) / 1000;
    } catch (error) {
      if (!(error instanceof StandardsInputError)) throw error;
      throw new RowFailure(key, `The ${DIMENSION_WORDS[key]} "${value}" cannot be read as a size.`);
    }
  }
  return dims;
}

/** The standard part, read by the engine from its designation; sizes in the row that contradict it reject the row. */
function readStandard(text: Cell, category: PartCategory | null, dims: Dims): ParsedRow["standard"] {
  const designation = required(
    text,
    "designation",
    "The standard designation is empty.",
    80,
    "The standard designation is longer than 80 characters.",
  );
  const kindText = text("standardKind");
  let kind: StandardKind | null = category ? KIND_FOR_CATEGORY[category] : null;
  if (kindText) {
    kind = KIND_WORDS.get(squash(kindText)) ?? null;
    const reason = `Unknown standard part kind "${kindText}". Use one of: ${STANDARD_KINDS.join(", ")}.`;
    if (!kind) throw new RowFailure("standardKind", reason);
  }
  // A gasket with a template is cut to it, not merely cut from sheet.
  if (!kindText && kind === "gasket_sheet" && text("template")) kind = "gasket";
  if (!kind) {
    const reason = "Say what kind of standard part it is: give the category or the standard part kind.";
    throw new RowFailure(kindText ? "standardKind" : "category", reason);
  }
  const checked = checkStandard({ kind, designation, ...dims, template: text("template") || null });
  const templateProblem = checked.checks.find((c) => c.level === "warning" && c.field === "standard.template");
  if (kind === "gasket" && text("template") && templateProblem)
    throw new RowFailure("template", templateProblem.message);
  const contradiction = checked.checks.find((c) => c.level === "warning" && c.field !== "standard.designation");
  if (contradiction)
    throw new RowFailure(contradiction.field.replace("standard.", "") as ImportField, contradiction.message);
  const { innerMm, outerMm, widthMm, lengthMm, attributes } = checked;
  return { kind, designation: checked.designation, innerMm, outerMm, widthMm, lengthMm, attributes };
}

function readFit(fitText: string): Fit {
  if (!fitText) return "dimensions_only";
  const read = FIT_WORDS.get(squash(fitText));
  if (!read) throw new RowFailure("fit", `Unknown fit "${fitText}". Use direct, with modification or dimensions only.`);
  return read;
}
