import { checkStandard } from "@/lib/proposals/checks";
import type { PartCategory, StandardKind } from "@/lib/catalogue/kinds";
import { round } from "@/lib/standards/units";

/** The kinds of standard part a calculator works out, and the part category a job list files each under. */
export const MEASURED_KINDS = ["bearing", "lip_seal", "v_belt"] as const;
export type MeasuredKind = (typeof MEASURED_KINDS)[number];

export const CATEGORY_OF_KIND: Record<MeasuredKind, PartCategory> = {
  bearing: "bearing",
  lip_seal: "lip_seal",
  v_belt: "v_belt",
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
}

/** The item as stored: its sizes read by the standards engine from the designation, as a proposal's are. */
export function toStandardItem(input: { kind: MeasuredKind; designation: string; note?: string }): StandardItem {
  const checked = checkStandard({ kind: input.kind as StandardKind, designation: input.designation });
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
  };
}
