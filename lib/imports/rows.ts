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

/**
 * Reads one spreadsheet row through the column mapping. The first problem found is returned with the column it is
 * in, so that the rejected-rows list can say exactly where to look.
 */
export function parseImportRow(record: Record<string, string | undefined>, mapping: ImportMappingValue): RowResult {
  const column = (field: ImportField) => mapping[field] ?? null;
  const text = (field: ImportField): string => {
    const c = column(field);
    return c ? (record[c] ?? "").trim() : "";
  };
  const fail = (field: ImportField | null, reason: string): RowResult => ({
    ok: false,
    problem: { column: field ? column(field) : null, reason },
  });

  const maker = text("maker");
  if (!maker) return fail("maker", "The maker is empty.");
  if (maker.length > 120) return fail("maker", "The maker's name is longer than 120 characters.");
  const number = text("number");
  if (!number) return fail("number", "The factory number is empty.");
  if (number.length > 60) return fail("number", "The factory number is longer than 60 characters.");
  if (!/[A-Za-z0-9]/.test(number)) return fail("number", "The factory number has no letter or digit.");

  let category: PartCategory | null = null;
  const categoryText = text("category");
  if (categoryText) {
    category = CATEGORY_WORDS.get(squash(categoryText)) ?? null;
    if (!category)
      return fail("category", `Unknown category "${categoryText}". Use one of: ${PART_CATEGORIES.join(", ")}.`);
  }

  const dims: Record<"innerMm" | "outerMm" | "widthMm" | "lengthMm", number | null> = {
    innerMm: null,
    outerMm: null,
    widthMm: null,
    lengthMm: null,
  };
  for (const key of ["innerMm", "outerMm", "widthMm", "lengthMm"] as const) {
    const value = text(key);
    if (!value) continue;
    try {
      dims[key] = Math.round(parseLength(value, "mm").mm * 1000) / 1000;
    } catch (error) {
      if (!(error instanceof StandardsInputError)) throw error;
      return fail(key, `The ${DIMENSION_WORDS[key]} "${value}" cannot be read as a size.`);
    }
  }

  const designation = text("designation");
  if (!designation) return fail("designation", "The standard designation is empty.");
  if (designation.length > 80) return fail("designation", "The standard designation is longer than 80 characters.");
  let kind: StandardKind | null = null;
  const kindText = text("standardKind");
  if (kindText) {
    kind = KIND_WORDS.get(squash(kindText)) ?? null;
    if (!kind)
      return fail(
        "standardKind",
        `Unknown standard part kind "${kindText}". Use one of: ${STANDARD_KINDS.join(", ")}.`,
      );
  } else if (category) {
    kind = KIND_FOR_CATEGORY[category];
  }
  if (!kind)
    return fail(
      kindText ? "standardKind" : "category",
      "Say what kind of standard part it is: give the category or the standard part kind.",
    );

  // The engine reads the designation; sizes in the row that contradict it reject the row.
  const checked = checkStandard({ kind, designation, ...dims });
  const contradiction = checked.checks.find((c) => c.level === "warning" && c.field !== "standard.designation");
  if (contradiction) {
    const key = contradiction.field.replace("standard.", "") as ImportField;
    return fail(key, contradiction.message);
  }

  let fit: Fit = "dimensions_only";
  const fitText = text("fit");
  if (fitText) {
    const read = FIT_WORDS.get(squash(fitText));
    if (!read) return fail("fit", `Unknown fit "${fitText}". Use direct, with modification or dimensions only.`);
    fit = read;
  }
  const notes = text("notes");
  if (notes.length > 2000) return fail("notes", "The notes are longer than 2000 characters.");
  const description = text("description");
  if (description.length > 200) return fail("description", "The description is longer than 200 characters.");

  return {
    ok: true,
    row: {
      maker,
      number,
      description: description || null,
      category,
      ...dims,
      standard: {
        kind,
        designation: checked.designation,
        innerMm: checked.innerMm,
        outerMm: checked.outerMm,
        widthMm: checked.widthMm,
        lengthMm: checked.lengthMm,
        attributes: checked.attributes,
      },
      fit,
      fitGiven: Boolean(fitText),
      notes: notes || null,
      machine: text("machine") || null,
      assembly: text("assembly") || null,
    },
  };
}
