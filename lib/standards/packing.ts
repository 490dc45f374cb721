import { StandardsInputError } from "@/lib/standards/errors";
import { fromMm, inchLabel, MM_PER_INCH, parseLength, round, tradeRound, type LengthUnit } from "@/lib/standards/units";

/**
 * Gland (compression) packing: square-section braided rings in a stuffing box, squeezed by a gland nut or follower
 * until they seal on the shaft.
 */

/**
 * The square sections packing is sold in. Common practice (no published source): merchants' sizes, inch sections in
 * sixteenths to 1/2 in and eighths above, metric in whole millimetres.
 */
export const PACKING_SECTIONS: Record<LengthUnit, number[]> = {
  in: [1 / 8, 5 / 32, 3 / 16, 7 / 32, 1 / 4, 5 / 16, 3 / 8, 7 / 16, 1 / 2, 5 / 8, 3 / 4, 7 / 8, 1],
  mm: [3, 4, 5, 6, 7, 8, 9, 10, 12, 14, 16, 18, 20, 22, 25],
};

export interface PackingInput {
  shaftMm: number;
  /** The stuffing box's bore. */
  boreMm: number;
  /** How deep the box is, from its bottom to the face the gland enters by; optional. */
  depthMm?: number;
  unit: LengthUnit;
}

export interface PackingSize {
  unit: LengthUnit;
  /** The square section to buy, in the unit measured in. */
  section: number;
  sectionLabel: string;
  /** (bore − shaft) / 2 as measured, before snapping. */
  measuredSection: number;
  /** How long to cut each ring: the circumference at shaft diameter plus one section. */
  cutLength: number;
  /** Rings that fill the box, or null when its depth was not given. */
  rings: number | null;
  /** The nearest section of the other system, for a box that may have been made to it. */
  otherSystem: { section: number; sectionLabel: string; unit: LengthUnit };
  label: string;
  notes: string[];
  warnings: string[];
}

const sectionLabelOf = (value: number, unit: LengthUnit) =>
  unit === "in" ? `${inchLabel(value)} square` : `${round(value, 1)} mm square`;

/** The sold section nearest to what the box leaves, in `unit`; ties go to the larger, which can be rolled down. */
function nearestSection(sectionMm: number, unit: LengthUnit): number {
  const sizes = PACKING_SECTIONS[unit].map((s) => (unit === "in" ? s * MM_PER_INCH : s));
  return sizes.reduce((best, s) =>
    Math.abs(s - sectionMm) < Math.abs(best - sectionMm) - 1e-9 ||
    (Math.abs(Math.abs(s - sectionMm) - Math.abs(best - sectionMm)) < 1e-9 && s > best)
      ? s
      : best,
  );
}

/** Joints staggered evenly round the shaft, so that no two line up: 120° for three rings, 90° for four or more. */
export function staggerAngle(rings: number | null): number {
  if (rings === null || rings >= 4) return 90;
  return rings === 3 ? 120 : 180;
}

/**
 * The packing for a stuffing box: the square section `(bore − shaft) / 2` snapped to the sections sold in the system
 * the box was measured in, the length to cut each ring (π × (shaft + section), the circumference at its middle), and
 * the number of rings that fill the box's depth.
 */
export function sizePacking(input: PackingInput): PackingSize {
  const { unit } = input;
  if (input.boreMm <= input.shaftMm)
    throw new StandardsInputError("The stuffing box's bore must be larger than the shaft.");
  const measuredMm = (input.boreMm - input.shaftMm) / 2;
  const sectionMm = nearestSection(measuredMm, unit);
  const other: LengthUnit = unit === "in" ? "mm" : "in";
  const otherMm = nearestSection(measuredMm, other);
  const cutLengthMm = Math.PI * (input.shaftMm + sectionMm);
  const rings = input.depthMm === undefined ? null : Math.floor((input.depthMm + 0.1 * sectionMm) / sectionMm);
  if (rings !== null && rings < 1)
    throw new StandardsInputError("The box is shallower than one ring of packing: measure its depth again.");
  const warnings: string[] = [];
  const off = (measuredMm - sectionMm) / sectionMm;
  if (Math.abs(off) > 0.15)
    warnings.push(
      `The box leaves ${round(fromMm(measuredMm, unit), unit === "in" ? 3 : 1)} ${unit} a side, ` +
        `${Math.round(Math.abs(off) * 100)} % ${off > 0 ? "more" : "less"} than the nearest section sold. ` +
        (off > 0
          ? "The box or the shaft may be worn: a worn shaft sleeve is the usual cause, and a new sleeve cures it."
          : "Roll the next size up flat with a round bar on the bench until it slides in; do not cut it down."),
    );
  if (sectionMm < 3)
    warnings.push("A section this small is unusual for a pump gland: check the bore was measured inside the box.");
  const show = (mm: number) => tradeRound(fromMm(mm, unit), unit);
  const section = round(fromMm(sectionMm, unit), unit === "in" ? 5 : 2);
  return {
    unit,
    section,
    sectionLabel: sectionLabelOf(section, unit),
    measuredSection: show(measuredMm),
    cutLength: show(cutLengthMm),
    rings,
    otherSystem: {
      section: round(fromMm(otherMm, other), other === "in" ? 5 : 2),
      sectionLabel: sectionLabelOf(round(fromMm(otherMm, other), 5), other),
      unit: other,
    },
    label: `Gland packing ${sectionLabelOf(section, unit)}`,
    notes: packingNotes(rings),
    warnings,
  };
}

function packingNotes(rings: number | null): string[] {
  const angle = staggerAngle(rings);
  return [
    "Cut each ring on a mandrel the size of the shaft, with a sharp knife: a square butt cut, or a 45° skive " +
      "cut for larger sections. The ends must just meet with no gap and no overlap.",
    `Fit the rings one at a time and seat each one with a split bush or the gland before the next; turn each ` +
      `joint ${angle}° from the last, so that no two joints line up.`,
    "Tighten the gland nut finger tight, start the pump, then take it up a sixth of a turn at a time. A packing " +
      "gland must weep a few drops a minute to stay cool: a dry gland burns the packing and scores the shaft.",
    "Use packing made for water pumps (braided yarn with a lubricant, often graphite or PTFE) on a water pump, " +
      "never plain hemp on a bronze shaft.",
  ];
}

/**
 * The section named in a designation: `Gland packing 1/4 in square`, `packing 6 mm sq`, `3/8" square`. A bare number
 * under 2 is inches. Null when no section can be read.
 */
export function readPackingSection(designation: string): { sectionMm: number; unit: LengthUnit } | null {
  const m = /(\d+(?:[.,]\d+)?(?:[- ]\d+\/\d+)?|\d+\/\d+)\s*(mm|in\.?|inch(?:es)?|")?\s*(?:square|sq\.?)?\s*$/i.exec(
    designation.trim(),
  );
  if (!m) return null;
  try {
    const explicit = m[2] ? (/^mm$/i.test(m[2]) ? "mm" : "in") : null;
    const bare = parseLength(m[1], "mm").value;
    const unit: LengthUnit = explicit ?? (bare < 2 || m[1].includes("/") ? "in" : "mm");
    return { sectionMm: round(parseLength(m[1], unit).mm, 4), unit };
  } catch {
    return null;
  }
}
