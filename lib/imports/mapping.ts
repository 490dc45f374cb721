import { IMPORT_FIELDS, type ImportField, type ImportMappingValue } from "@/lib/imports/kinds";

const squash = (title: string) =>
  title
    .normalize("NFKC")
    .toLowerCase()
    .replace(/[\s\-_.()/]+/g, "");

/** Matches a file's column titles to the catalogue's fields by name; each column is used at most once. */
export function proposeMapping(headers: string[]): ImportMappingValue {
  const mapping: ImportMappingValue = {};
  const used = new Set<string>();
  for (const field of IMPORT_FIELDS) {
    const hit = field.names.map((name) => headers.find((h) => !used.has(h) && squash(h) === name)).find(Boolean);
    mapping[field.key] = hit ?? null;
    if (hit) used.add(hit);
  }
  return mapping;
}

/** The required fields a mapping leaves without a column, by label. */
export function missingRequired(mapping: ImportMappingValue): string[] {
  return IMPORT_FIELDS.filter((f) => f.required && !mapping[f.key]).map((f) => f.label);
}

/** Keeps only known fields pointing at columns the file has. */
export function cleanMapping(mapping: Record<string, unknown>, headers: string[]): ImportMappingValue {
  const clean: ImportMappingValue = {};
  for (const field of IMPORT_FIELDS) {
    const column = mapping[field.key];
    clean[field.key as ImportField] = typeof column === "string" && headers.includes(column) ? column : null;
  }
  return clean;
}
