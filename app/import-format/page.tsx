import type { Metadata } from "next";
import { CATEGORY_NAMES, PART_CATEGORIES } from "@/lib/catalogue/kinds";
import { IMPORT_FIELDS, IMPORT_MAX_BYTES } from "@/lib/imports/kinds";

export const metadata: Metadata = { title: "Import format" };

const MEANING: Record<string, string> = {
  maker:
    "The maker's name as in the catalogue. A name the catalogue does not " +
    "know yet is added as a new maker (catalogue imports only).",
  number: "The factory number as stamped or printed; spacing, dashes and case do not matter.",
  description: "What the part is. Needed when the part is new to the catalogue.",
  category:
    `The kind of part: ` +
    `${PART_CATEGORIES.map((c) => CATEGORY_NAMES[c]).join(", ")}. Needed ` +
    `for a new part unless the standard part says it.`,
  innerMm:
    "Sizes of the original part, in millimetres; 25,4 and 1 in are read " +
    "too. A bearing or belt designation that contradicts them rejects the " +
    "row.",
  outerMm: "",
  widthMm: "",
  lengthMm: "",
  standardKind: "The kind of standard part, when it is not the usual one for the category (e.g. sleeve).",
  designation: "The modern standard part: 6205-2RS, 35 × 52 × 8, B43.",
  fit: "direct, with modification or dimensions only. Empty means dimensions only: nobody has said they fitted it.",
  notes: "Anything the next person should know.",
  machine: "A machine model of that maker, as in the catalogue, to say where the part is used.",
  assembly: "Where on the machine: Water pump, Fan hub, …; needed with a machine.",
};

export default function ImportFormatPage() {
  return (
    <div className="max-w-4xl space-y-6">
      <h1 className="text-3xl">The import format</h1>
      <p className="text-lg">
        One row for each cross: an original part and the standard part that replaces it. Save the spreadsheet as CSV,
        UTF-8 or Windows-1252, with commas or semicolons between columns and the column titles on the first line;
        {" up to "}
        {IMPORT_MAX_BYTES / 1024 / 1024} MB. The titles below are recognised as they are; other titles are matched by
        hand on the import&apos;s page.
      </p>
      <p>
        <a href="/import-format/sample.csv" download>
          Download the sample file
        </a>{" "}
        (invented makers and numbers, with good rows and the usual mistakes).
      </p>
      <div className="overflow-x-auto rounded-lg border border-rule bg-ground-raised">
        <table className="w-full text-left">
          <thead className="bg-ground-sunk text-sm">
            <tr>
              <th scope="col" className="p-3">
                Field
              </th>
              <th scope="col" className="p-3">
                Column titles recognised
              </th>
              <th scope="col" className="p-3">
                Meaning
              </th>
            </tr>
          </thead>
          <tbody>
            {IMPORT_FIELDS.map((f) => (
              <tr key={f.key} className="border-t border-rule align-top">
                <td className="p-3 font-bold">
                  {f.label}
                  {f.required ? " (needed)" : ""}
                </td>
                <td className="p-3 num text-sm">{f.names.slice(0, 4).join(", ")}</td>
                <td className="p-3 text-sm">{MEANING[f.key] || "As above."}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-ink-soft">
        The full description, with how rows are counted and what a rollback does, is in docs/import-format.md in the
        source.
      </p>
    </div>
  );
}
