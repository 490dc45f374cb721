import { StandardsInputError } from "@/lib/standards/errors";
import {
  BELT_SECTIONS,
  METRIC_CLASSICAL,
  R40,
  type BeltSection,
  type LengthBasis,
} from "@/lib/standards/belt-sections";
import { byScore, describeDeviations, scoreDimensions, type Deviation } from "@/lib/standards/match";
import { fromMm, round, toMm, type LengthUnit } from "@/lib/standards/units";

const bySection = new Map(BELT_SECTIONS.map((s) => [s.section, s]));

export class BeltError extends StandardsInputError {}

export function findSection(section: string): BeltSection {
  const found = bySection.get(section.trim().toUpperCase()) ?? bySection.get(section.trim());
  if (!found)
    throw new BeltError(
      `"${section}" is not a belt section we know. Known: ${BELT_SECTIONS.filter((s) => s.family !== "automotive")
        .map((s) => s.section)
        .join(", ")}.`,
    );
  return found;
}

export interface BeltLengths {
  inside: number;
  pitch: number;
  outside: number;
}

/** The three lengths of one belt, from any one of them, in the section's own unit. */
export function beltLengths(section: BeltSection, basis: LengthBasis | "pitch", length: number): BeltLengths {
  if (section.height === null || section.pitchOffset === null) {
    throw new BeltError(
      `${section.section} belts are sold by top width and outside length; their lengths are not converted.`,
    );
  }
  const toOutside = 2 * Math.PI * section.height;
  const long = section.long;
  let inside: number;
  if (basis === "inside") inside = length;
  else if (basis === "outside") inside = length - toOutside;
  // A datum length long enough to be a long belt's is read with the long offset (B225 = 225.3 in datum, not 226.8).
  else
    inside =
      long && length - long.pitchOffset >= long.fromInside ? length - long.pitchOffset : length - section.pitchOffset;
  const offset = long && inside >= long.fromInside ? long.pitchOffset : section.pitchOffset;
  return { inside, pitch: inside + offset, outside: inside + toOutside };
}

export interface DecodedBelt {
  designation: string;
  section: string;
  family: string;
  unit: "in" | "mm";
  insideLength: number;
  pitchLength: number;
  outsideLength: number;
  designatedBy: LengthBasis;
  topWidth: number;
  height: number | null;
  angleDeg: number;
  notes: string[];
}

// Beyond these inside lengths in inches no classical belt is made (IP-20 tables end at A180, B360, C420, D660, E660):
// a larger number is a metric length in millimetres written without its Li/Ld/La.
const LONGEST_INCH: Record<string, number> = { A: 200, B: 400, C: 450, D: 700, E: 700 };

const METRIC_BASIS: Record<string, LengthBasis> = {
  LI: "inside",
  LD: "datum",
  LW: "datum",
  LP: "datum",
  LA: "outside",
};

/**
 * Decodes `B60`, `B-60`, `4L380`, `5V800`, `SPA1250`, `spa 1250`, and metric classical belts by their marked length in
 * millimetres: `B 1600 Li` (inside), `B 1640 Ld` (datum), `B 1669 La` (outside), also `Z 800 Li` and `SPA 1232 Li`.
 */
export function decodeBelt(input: string): DecodedBelt {
  const text = input
    .trim()
    .toUpperCase()
    .replace(/[\s-]+/g, "");
  const metric = /^(SPZ|SPA|SPB|SPC|[ZA-E])(\d+(?:\.\d+)?)(LI|LD|LW|LP|LA)$/.exec(text);
  if (metric) return decodeMetricBelt(input, metric[1], Number(metric[2]), METRIC_BASIS[metric[3]]);
  const m = /^(SPZ|SPA|SPB|SPC|[2-5]L|[358]V|[A-E])(\d+(?:\.\d+)?)$/.exec(text);
  if (!m)
    throw new BeltError(
      `"${input.trim()}" is not a V-belt designation we can read. Try B60, 4L380, 5V800, SPA1250 or B 1600 Li.`,
    );
  if (/^[A-E]$/.test(m[1]) && Number(m[2]) > LONGEST_INCH[m[1]]) {
    throw new BeltError(
      `${m[1]}${m[2]} would be ${m[2]} in long. A metric belt is marked with ` +
        `its length in millimetres and what was measured: ${m[1]} ${m[2]} Li ` +
        `(inside), Ld (datum) or La (outside).`,
    );
  }
  const section = findSection(m[1]);
  const number = Number(m[2]);
  if (section.designationScale === 10 && !Number.isInteger(number)) {
    throw new BeltError(
      `${section.section} lengths are written in tenths of an inch without a point: 4L380 is 38.0 in.`,
    );
  }
  const length = number / section.designationScale;
  const lengths = beltLengths(section, section.designatedBy, length);
  if (lengths.inside <= 0) throw new BeltError(`${input.trim()} is too short to be a ${section.section} belt.`);
  const digits = section.unit === "in" ? 2 : 0;
  const notes = [
    {
      inside: `The number is the inside length in inches (${section.section}${m[2]} = ${length} in inside).`,
      outside: `The number is the outside length in tenths of an inch (${section.section}${m[2]} = ${length} in).`,
      datum: `The number is the datum (pitch) length in millimetres.`,
    }[section.designatedBy],
  ];
  if (section.section === "4L")
    notes.push(
      "A 4L belt has the same section as an A belt but is made for light " +
        "duty; on a tractor or engine drive use an A belt of the same pitch " +
        "length (about 2 in shorter by number).",
    );
  if (section.section === "5L")
    notes.push(
      "A 5L belt matches a B belt's section but is light-duty; use a B belt " +
        "of the same pitch length on a working drive.",
    );
  return {
    designation: `${section.section}${m[2]}`,
    section: section.section,
    family: section.family,
    unit: section.unit,
    insideLength: round(lengths.inside, digits),
    pitchLength: round(lengths.pitch, digits),
    outsideLength: round(lengths.outside, digits),
    designatedBy: section.designatedBy,
    topWidth: section.topWidth,
    height: section.height,
    angleDeg: section.angleDeg,
    notes,
  };
}

/** A metric classical or ISO narrow belt given by one of its lengths in millimetres, with the inch belt nearest it. */
function decodeMetricBelt(input: string, sectionName: string, length: number, basis: LengthBasis): DecodedBelt {
  const classical = METRIC_CLASSICAL.find((s) => s.section === sectionName && !sectionName.startsWith("SP"));
  const narrow = sectionName.startsWith("SP") ? findSection(sectionName) : null;
  const height = classical?.height ?? narrow?.height ?? 0;
  const datumOffset = classical?.datumOffset ?? narrow?.pitchOffset ?? 0;
  const toOutside = 2 * Math.PI * height;
  const inside = basis === "inside" ? length : basis === "outside" ? length - toOutside : length - datumOffset;
  if (inside <= 0) throw new BeltError(`${input.trim()} is too short to be a ${sectionName} belt.`);
  const word = { inside: "Li", datum: "Ld", outside: "La" }[basis];
  const notes = [
    `The number is the ${basis === "datum" ? "datum (pitch)" : basis} length in millimetres (ISO 4184 ${word}).`,
    classical
      ? `For a metric ${sectionName} belt: datum = inside + ${datumOffset} mm, ` +
        `outside = inside + ${Math.round(toOutside)} mm (ISO 4184).`
      : `ISO narrow belts are sold by datum length: ask for ${sectionName}${Math.round(inside + datumOffset)}.`,
  ];
  const inch =
    classical && sectionName !== "Z"
      ? BELT_SECTIONS.find((s) => s.section === sectionName && s.family === "classical")
      : undefined;
  if (inch) {
    // The same belt by the inch numbering: the inch belt of the nearest datum length.
    const pitchIn = (inside + datumOffset) / 25.4;
    const inchInside = Math.round(beltLengths(inch, "pitch", pitchIn).inside);
    notes.push(
      `By inch numbering, the nearest is ${sectionName}${inchInside} ` +
        `(${round(beltLengths(inch, "inside", inchInside).pitch, 1)} in datum ` +
        `length).`,
    );
  }
  return {
    designation: `${sectionName} ${round(length, 0)} ${word}`,
    section: sectionName,
    family: classical ? "classical" : "iso-narrow",
    unit: "mm",
    insideLength: Math.round(inside),
    pitchLength: Math.round(inside + datumOffset),
    outsideLength: Math.round(inside + toOutside),
    designatedBy: basis,
    topWidth: classical?.topWidth ?? narrow?.topWidth ?? 0,
    height,
    angleDeg: 40,
    notes,
  };
}

/** Nearby standard lengths in the section's designation basis, nearest first. */
export function nearestStandardLengths(
  section: BeltSection,
  designatedLength: number,
  count = 3,
): Array<{ designation: string; length: number; nearest: boolean }> {
  let lengths: number[];
  if (section.family === "narrow")
    lengths = [10, 100].flatMap((k) => R40.map((n) => (n * k) / 100)); // 25.0 … 950 in, tenths below
  else if (section.family === "iso-narrow")
    lengths = [1, 10].flatMap((k) => R40.map((n) => n * k)); // 100 … 9500 mm
  else {
    // Classical and light-duty belts are commonly stocked in whole-inch steps: common practice (no published source).
    const centre = Math.round(designatedLength);
    lengths = Array.from({ length: 9 }, (_, i) => centre - 4 + i).filter((n) => n > 10);
  }
  const nearest = lengths
    .map((length) => ({ length, distance: Math.abs(length - designatedLength) }))
    .sort((a, b) => a.distance - b.distance)
    .slice(0, count);
  return nearest
    .map(({ length }) => ({
      designation: `${section.section}${round(length * section.designationScale, 1)}`,
      length,
      nearest: length === nearest[0]?.length,
    }))
    .sort((a, b) => a.length - b.length);
}

export interface SectionCandidate {
  section: string;
  family: string;
  angleDeg: number;
  topWidth: number;
  height: number | null;
  unit: "in" | "mm";
  score: number;
  deviations: Deviation[];
  explanation: string;
  warnings: string[];
}

/**
 * The likely section from a measured top width and (optionally) thickness. A used belt has worn narrower at the top,
 * which is forgiven; sections of similar width but different depth or angle are pointed out.
 */
export function identifySection(input: {
  topWidthMm: number;
  heightMm?: number;
  unit: LengthUnit;
  toleranceMm?: number;
}): SectionCandidate[] {
  const tolerance = input.toleranceMm ?? Math.max(0.5, input.topWidthMm * 0.04);
  const measured = [
    {
      name: "top",
      label: "top width",
      measuredMm: input.topWidthMm,
      toleranceMm: tolerance,
      surface: "belt-width" as const,
    },
    ...(input.heightMm
      ? [{ name: "height", label: "thickness", measuredMm: input.heightMm, toleranceMm: tolerance }]
      : []),
  ];
  const out: SectionCandidate[] = [];
  for (const s of BELT_SECTIONS) {
    // Automotive belts have no tabulated thickness and are compared on top width alone.
    const nominal: Record<string, number> = { top: toMm(s.topWidth, s.unit) };
    if (s.height !== null) nominal.height = toMm(s.height, s.unit);
    const scored = scoreDimensions(measured, nominal, input.unit);
    if (!scored) continue;
    // A section with no tabulated thickness cannot confirm a measured one, so it ranks below one that can.
    const unconfirmed = input.heightMm !== undefined && s.height === null;
    out.push({
      section: s.section,
      family: s.family,
      angleDeg: s.angleDeg,
      topWidth: s.topWidth,
      height: s.height,
      unit: s.unit,
      score: unconfirmed ? Math.round(scored.score * 0.85 * 1000) / 1000 : scored.score,
      deviations: scored.deviations,
      explanation: describeDeviations(scored.deviations, input.unit),
      warnings: [],
    });
  }
  out.sort(byScore);
  if (out[0]) warnOfLookAlikes(out, input.unit);
  return out.slice(0, 6);
}

/**
 * The trap of similar widths, said on the candidates: sections with nearly the same top as the best but another
 * depth (whether or not they matched), another angle, or a light-duty belt where a classical one belongs.
 */
function warnOfLookAlikes(out: SectionCandidate[], unit: LengthUnit): void {
  const best = out[0];
  const bestSection = findSection(best.section);
  for (const s of BELT_SECTIONS) {
    if (s === bestSection || s.height === null || bestSection.height === null) continue;
    const topDiff = Math.abs(toMm(s.topWidth, s.unit) - toMm(bestSection.topWidth, bestSection.unit));
    const depthDiff = Math.abs(toMm(s.height, s.unit) - toMm(bestSection.height, bestSection.unit));
    if (topDiff <= 1 && depthDiff > 1) {
      best.warnings.push(
        `${s.section} has nearly the same top width but is ` +
          `${round(fromMm(depthDiff, unit), 2)} ${unit} ` +
          `${toMm(s.height, s.unit) > toMm(bestSection.height, bestSection.unit) ? "deeper" : "shallower"}: ` +
          "it rides at another height in the groove. Measure the thickness to be sure.",
      );
    }
  }
  for (const other of out.slice(1)) {
    if (other.angleDeg !== best.angleDeg)
      other.warnings.push(
        `Section angle ${other.angleDeg}° against ${best.angleDeg}°: it will not seat the same in the pulley groove.`,
      );
    const depthDiff =
      other.height !== null && best.height !== null
        ? Math.abs(toMm(other.height, other.unit) - toMm(best.height, best.unit))
        : 0;
    if (depthDiff > 1)
      other.warnings.push(
        `Similar top width to ${best.section} but ` +
          `${round(fromMm(depthDiff, unit), 2)} ${unit} different in ` +
          `depth: it sits at a different height in the groove and changes the ` +
          `drive ratio and tension.`,
      );
    if (other.family === "light-duty" && best.family === "classical")
      other.warnings.push(
        "Light-duty belts are for fractional-horsepower drives; on an engine or " +
          "tractor drive use the classical section.",
      );
  }
}

/** A belt's measured length, from the ways people measure an old one, as a pitch length. */
export const BELT_MEASURING_NOTES = [
  "A used belt has stretched: it measures longer than it was new, often by 1 % or more.",
  "A broken belt laid flat and measured along its middle reads between " +
    "its inside and outside length, near the pitch length.",
  "With the pulleys in hand, the surest figure is a string run round both " +
    "pulleys at the depth the belt rode, at the centre distance the belt " +
    "was set to.",
];

/** Standard belts of a section near a drive's pitch length, named as they are sold (B60, 4L380, SPA1250). */
export function standardLengthsForPitch(section: BeltSection, pitchMm: number) {
  if (section.height === null || section.pitchOffset === null) return [];
  const lengths = beltLengths(section, "pitch", fromMm(pitchMm, section.unit));
  const designated = { inside: lengths.inside, outside: lengths.outside, datum: lengths.pitch }[section.designatedBy];
  return nearestStandardLengths(section, designated);
}
