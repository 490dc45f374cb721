import { AppError } from "@/lib/errors";
import { checkStandard } from "@/lib/proposals/checks";
import type { PartCategory, StandardKind } from "@/lib/catalogue/kinds";
import { round } from "@/lib/standards/units";

/** The kinds of standard part a calculator works out, and the part category a job list files each under. */
export const MEASURED_KINDS = [
  "bearing",
  "lip_seal",
  "v_belt",
  "felt",
  "packing",
  "plug",
  "gasket",
  "key",
  "pin",
  "thread",
  "grease_fitting",
  "chain",
] as const;
export type MeasuredKind = (typeof MEASURED_KINDS)[number];

export const CATEGORY_OF_KIND: Record<MeasuredKind, PartCategory> = {
  bearing: "bearing",
  lip_seal: "lip_seal",
  v_belt: "v_belt",
  felt: "felt_seal",
  packing: "packing",
  plug: "plug",
  gasket: "gasket",
  key: "key",
  pin: "pin",
  thread: "fastener",
  grease_fitting: "grease_fitting",
  chain: "chain",
};

/** A standard part on a job list by its designation and sizes, worked out from measurements, with no factory part. */
export interface StandardItem {
  kind: MeasuredKind;
  designation: string;
  /** What the person measured and what to check the new part against, in words: `seal OD 2.376 to 2.380 in`. */
  note: string | null;
  innerMm: number | null;
  outerMm: number | null;
  widthMm: number | null;
  lengthMm: number | null;
  /** A gasket's template query, to print it again from the list. */
  template?: string | null;
}

/** The item as stored: its sizes read by the standards engine from the designation, as a proposal's are. */
export function toStandardItem(input: {
  kind: MeasuredKind;
  designation: string;
  note?: string;
  template?: string;
}): StandardItem {
  const checked = checkStandard({
    kind: input.kind as StandardKind,
    designation: input.designation,
    template: input.template,
  });
  if (input.kind === "gasket" && input.template && checked.attributes.template === undefined)
    throw new AppError("validation_failed", checked.checks[0]?.message ?? "The template cannot be drawn.", {
      field: "standard.template",
    });
  // Kept to the micrometre: an inch size in mm (1-1/2 in = 38.1 mm) carries no binary noise into lists and CSV files.
  const size = (v: number | null) => (v === null ? null : round(v, 3));
  return {
    kind: input.kind,
    designation: checked.designation,
    note: input.note?.trim() || null,
    innerMm: size(checked.innerMm),
    outerMm: size(checked.outerMm),
    widthMm: size(checked.widthMm),
    lengthMm: size(checked.lengthMm),
    ...(typeof checked.attributes.template === "string" ? { template: checked.attributes.template } : {}),
  };
}
