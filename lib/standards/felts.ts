import { StandardsInputError } from "@/lib/standards/errors";
import { nominalCandidates } from "@/lib/standards/nominal";
import { fromMm, lengthLabel, MM_PER_INCH, round, tradeRound, type LengthUnit } from "@/lib/standards/units";

/**
 * Felt rings and strips cut to a seat. A felt seal sits in a rectangular groove (the seat) round the shaft: the ring
 * is cut from sheet felt, or a strip is laid into the groove and its ends butted.
 */

/**
 * The thicknesses sheet and strip felt are sold in. Common practice (no published source): merchants' sizes, in
 * sixteenths of an inch and whole millimetres.
 */
export const FELT_THICKNESSES: Record<LengthUnit, number[]> = {
  in: [1 / 16, 1 / 8, 3 / 16, 1 / 4, 5 / 16, 3 / 8, 7 / 16, 1 / 2, 5 / 8, 3 / 4, 1],
  mm: [1, 2, 3, 4, 5, 6, 8, 10, 12, 15, 20, 25],
};

export const FELT_GRADE = "hard wool felt for seals, grade F-1 or F-2 (SAE J314, wool felt grades)";

export interface FeltInput {
  shaftMm: number;
  /** The seat's (groove's) bore: the outside of the ring. */
  boreMm: number;
  /** The seat's width along the shaft: the ring's thickness. */
  widthMm: number;
  unit: LengthUnit;
}

export interface FeltSize {
  unit: LengthUnit;
  ring: { inside: number; outside: number; thickness: number };
  strip: { width: number; thickness: number; cutLength: number };
  /** What to ask for: `Felt ring 1-1/4 × 1-3/4 × 1/4 in`, the designation of the standard part too. */
  label: string;
  askFor: string;
  notes: string[];
  warnings: string[];
  source: string;
}

/** The sold thickness at or just above `mm`: felt compresses into its seat, so the next size up, never down. */
function soldThickness(mm: number, unit: LengthUnit): number {
  const sizes = FELT_THICKNESSES[unit].map((t) => (unit === "in" ? t * MM_PER_INCH : t));
  return sizes.find((t) => t >= mm - 0.05) ?? sizes[sizes.length - 1];
}

/** The nominal size a measured diameter was made to, in the system it was measured in. */
function nominalIn(mm: number, unit: LengthUnit, surface: "shaft" | "housing"): number {
  const system = unit === "in" ? "inch" : "metric";
  const best = nominalCandidates(mm, unit, surface).find((c) => c.system === system);
  return best ? best.nominalMm : mm;
}

/**
 * The felt ring for a seat, and the strip to cut it from. The ring's inside is the shaft's nominal size, its outside
 * the seat's bore, its thickness the seat's width taken up to the next felt sold. The strip laid into the groove is as
 * wide as the seat and as thick as the seat is deep, cut to the circumference at the mean diameter of the seat.
 */
export function sizeFelt(input: FeltInput): FeltSize {
  const { unit } = input;
  if (input.boreMm <= input.shaftMm)
    throw new StandardsInputError("The seat's bore must be larger than the shaft: measure the groove's outside.");
  const depthMm = (input.boreMm - input.shaftMm) / 2;
  const insideMm = nominalIn(input.shaftMm, unit, "shaft");
  const outsideMm = nominalIn(input.boreMm, unit, "housing");
  const thicknessMm = soldThickness(input.widthMm, unit);
  const stripThicknessMm = soldThickness(depthMm, unit);
  const cutLengthMm = Math.PI * ((input.shaftMm + input.boreMm) / 2);
  const show = (mm: number) => tradeRound(fromMm(mm, unit), unit);
  const label =
    `Felt ring ${lengthLabel(round(fromMm(insideMm, unit), 4), unit).replace(/ (in|mm)$/, "")} × ` +
    `${lengthLabel(round(fromMm(outsideMm, unit), 4), unit).replace(/ (in|mm)$/, "")} × ` +
    `${lengthLabel(round(fromMm(thicknessMm, unit), 4), unit)}`;
  const warnings: string[] = [];
  if (depthMm < 2)
    warnings.push(
      "The seat is less than 2 mm deep: a felt this thin will not hold oil or keep out dirt for long. " +
        "Check that the bore was measured in the groove, not at the housing's mouth.",
    );
  if (depthMm > 15)
    warnings.push("The seat is unusually deep for a felt: check that the bore was measured in the felt's groove.");
  if (thicknessMm - input.widthMm > 0.5 * input.widthMm)
    warnings.push("The seat is narrower than most felt sold: split a thicker felt, or cut a ring from felt sheet.");
  return {
    unit,
    ring: { inside: show(insideMm), outside: show(outsideMm), thickness: show(thicknessMm) },
    strip: { width: show(thicknessMm), thickness: show(stripThicknessMm), cutLength: show(cutLengthMm) },
    label,
    askFor: `${lengthLabel(round(fromMm(thicknessMm, unit), 4), unit)} ${FELT_GRADE}`,
    notes: FELT_NOTES,
    warnings,
    source: `Felt grade: SAE J314, wool felt grades; cut length: the circumference at the seat's mean diameter`,
  };
}

export const FELT_NOTES = [
  "Cut the ends square with a sharp knife against a straight edge, and butt them together in the groove: " +
    "an overlap makes a hard lump that wears the shaft.",
  "Soak the felt in warm engine oil before fitting, so that it does not run hot and dry on the first start.",
  "A felt keeps dirt out and a little oil in; it is not an oil seal. Where oil stands against it, fit a lip seal.",
  "Fit the felt so that it presses lightly on the shaft all round; a felt that does not touch the shaft does nothing.",
];
