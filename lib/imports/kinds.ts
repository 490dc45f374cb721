export const IMPORT_STATUSES = [
  "uploaded",
  "parsing",
  "parsed",
  "committing",
  "committed",
  "failed",
  "rolled_back",
] as const;
export type ImportStatus = (typeof IMPORT_STATUSES)[number];

/** Admins import into the catalogue; moderators may import into the review queue, as proposals to be decided. */
export const IMPORT_TARGETS = ["catalogue", "review_queue"] as const;
export type ImportTarget = (typeof IMPORT_TARGETS)[number];

export const TARGET_WORDS: Record<ImportTarget, string> = {
  catalogue: "the catalogue",
  review_queue: "the review queue",
};

export const STATUS_WORDS: Record<ImportStatus, string> = {
  uploaded: "Stored, waiting to be read",
  parsing: "Reading the file (dry run)",
  parsed: "Dry run done: check and commit",
  committing: "Committing",
  committed: "Committed",
  failed: "Failed: nothing was changed",
  rolled_back: "Rolled back",
};

/**
 * The catalogue fields a spreadsheet's columns map to. `names` are the column titles recognised without help,
 * compared in lower case with spaces, dashes, dots and underscores removed.
 */
export const IMPORT_FIELDS = [
  {
    key: "maker",
    label: "Maker",
    required: true,
    names: ["maker", "manufacturer", "make", "brand", "hersteller", "fabricant"],
  },
  {
    key: "number",
    label: "Factory number",
    required: true,
    names: [
      "factorynumber",
      "number",
      "partnumber",
      "partno",
      "partnr",
      "originalnumber",
      "oldnumber",
      "teilenummer",
      "reference",
      "ref",
    ],
  },
  {
    key: "description",
    label: "Description",
    required: false,
    names: ["description", "desc", "name", "part", "partname", "bezeichnung"],
  },
  {
    key: "category",
    label: "Kind of part",
    required: false,
    names: ["category", "kind", "type", "parttype", "kindofpart"],
  },
  {
    key: "innerMm",
    label: "Bore / shaft (mm)",
    required: false,
    names: ["boremm", "bore", "innerdiameter", "shaft", "shaftmm", "shaftdiameter"],
  },
  {
    key: "outerMm",
    label: "Outside diameter (mm)",
    required: false,
    names: ["odmm", "od", "outerdiameter", "outsidediameter", "outside", "housingbore"],
  },
  { key: "widthMm", label: "Width (mm)", required: false, names: ["widthmm", "width", "thickness"] },
  { key: "lengthMm", label: "Length (mm)", required: false, names: ["lengthmm", "length"] },
  {
    key: "standardKind",
    label: "Standard part kind",
    required: false,
    names: ["standardkind", "standardtype", "stdkind"],
  },
  {
    key: "designation",
    label: "Standard designation",
    required: true,
    names: [
      "standarddesignation",
      "designation",
      "standard",
      "standardpart",
      "replacement",
      "modernpart",
      "equivalent",
      "stdpart",
      "isodesignation",
    ],
  },
  {
    key: "template",
    label: "Gasket template",
    required: false,
    names: ["template", "gaskettemplate", "templatelink"],
  },
  { key: "fit", label: "Fit", required: false, names: ["fit", "fits", "interchange", "fitment"] },
  { key: "notes", label: "Notes", required: false, names: ["notes", "note", "remarks", "comment", "comments"] },
  {
    key: "machine",
    label: "Machine model",
    required: false,
    names: ["machine", "model", "machinemodel", "tractor", "engine"],
  },
  {
    key: "assembly",
    label: "Place on the machine",
    required: false,
    names: ["assembly", "location", "position", "group", "placeonthemachine"],
  },
] as const;

export type ImportField = (typeof IMPORT_FIELDS)[number]["key"];

/** Field → the column title it is read from (null: not in this file). */
export type ImportMappingValue = Partial<Record<ImportField, string | null>>;

export interface ImportCounts {
  rows: number;
  newParts: number;
  newCrosses: number;
  updates: number;
  unchanged: number;
  rejected: number;
  newMakers: number;
  newStandardParts: number;
  /**
   * The names of the makers and standard parts a commit adds (the first 200 of each), so they can be checked by eye.
   */
  newMakerNames?: string[];
  newStandardPartNames?: string[];
}

/** How many new names a summary keeps; the counts above are always whole. */
export const NAMES_KEPT = 200;

export interface ImportProgress {
  phase: "parsing" | "committing";
  rows: number;
  bytes: number;
  totalBytes: number;
}

export const IMPORT_MAX_BYTES = 50 * 1024 * 1024;
