import { inchLabel } from "@/lib/standards/units";

/**
 * V-belt cross-sections. Widths and heights in the unit the section is designated in (inches for A–E, 2L–5L, 3V–8V
 * and automotive; millimetres for SP). `pitchOffset` is how much longer the pitch (datum) length is than the inside
 * length; the outside length is the inside length plus 2π × height, since the belt's outer face runs a circle
 * one belt-height further out.
 */
export type BeltFamily = "classical" | "light-duty" | "narrow" | "iso-narrow" | "automotive";
export type LengthBasis = "inside" | "outside" | "datum";

export interface BeltSection {
  section: string;
  family: BeltFamily;
  unit: "in" | "mm";
  topWidth: number;
  height: number | null;
  pitchOffset: number | null;
  /**
   * Long classical belts: from this inside length on, the datum length is the inside length plus `longPitchOffset`
   * instead of `pitchOffset` (RMA/MPTA IP-20 length table).
   */
  long?: { fromInside: number; pitchOffset: number };
  angleDeg: number;
  /** What the number in the designation measures, and in what steps (B60: inside inches; 4L380: outside tenths). */
  designatedBy: LengthBasis;
  designationScale: number;
  note: string;
}

export const BELT_SECTIONS: BeltSection[] = [
  // Classical sections, inch (RMA/MPTA IP-20). Widths and heights are the published nominal ones. Datum (pitch) length
  // = inside + A 1.3, B 1.8, C 2.9, D 3.3, E 4.5 in; from B225, C225 and D225 on the table's datum lengths are inside
  // + 0.3, 0.9 and 0.8 in (both confirmed against the vbelts package's classical length table, docs/standards.md);
  // E from E240 on, + 1.0 in, is not yet confirmed.
  {
    section: "A",
    family: "classical",
    unit: "in",
    topWidth: 0.5,
    height: 0.3125,
    pitchOffset: 1.3,
    angleDeg: 40,
    designatedBy: "inside",
    designationScale: 1,
    note: "classical, 1/2 in top",
  },
  {
    section: "B",
    family: "classical",
    unit: "in",
    topWidth: 0.65625,
    height: 0.40625,
    pitchOffset: 1.8,
    long: { fromInside: 225, pitchOffset: 0.3 },
    angleDeg: 40,
    designatedBy: "inside",
    designationScale: 1,
    note: "classical, 21/32 in top",
  },
  {
    section: "C",
    family: "classical",
    unit: "in",
    topWidth: 0.875,
    height: 0.53125,
    pitchOffset: 2.9,
    long: { fromInside: 225, pitchOffset: 0.9 },
    angleDeg: 40,
    designatedBy: "inside",
    designationScale: 1,
    note: "classical, 7/8 in top",
  },
  {
    section: "D",
    family: "classical",
    unit: "in",
    topWidth: 1.25,
    height: 0.75,
    pitchOffset: 3.3,
    long: { fromInside: 225, pitchOffset: 0.8 },
    angleDeg: 40,
    designatedBy: "inside",
    designationScale: 1,
    note: "classical, 1-1/4 in top",
  },
  {
    section: "E",
    family: "classical",
    unit: "in",
    topWidth: 1.5,
    height: 0.90625,
    pitchOffset: 4.5,
    long: { fromInside: 240, pitchOffset: 1.0 },
    angleDeg: 40,
    designatedBy: "inside",
    designationScale: 1,
    note: "classical, 1-1/2 in top",
  },
  // Light-duty (fractional horsepower) sections, designated by outside length in tenths of an inch (RMA IP-23).
  // Pitch offsets from the classical section of the same top width, and 0.6 × height for 2L and 3L: from memory.
  {
    section: "2L",
    family: "light-duty",
    unit: "in",
    topWidth: 0.25,
    height: 0.15625,
    pitchOffset: 0.59,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "light-duty, 1/4 in top",
  },
  {
    section: "3L",
    family: "light-duty",
    unit: "in",
    topWidth: 0.375,
    height: 0.21875,
    pitchOffset: 0.82,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "light-duty, 3/8 in top",
  },
  {
    section: "4L",
    family: "light-duty",
    unit: "in",
    topWidth: 0.5,
    height: 0.3125,
    pitchOffset: 1.3,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "light-duty, 1/2 in top",
  },
  {
    section: "5L",
    family: "light-duty",
    unit: "in",
    topWidth: 0.65625,
    height: 0.375,
    pitchOffset: 1.8,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "light-duty, 21/32 in top",
  },
  // Narrow sections, designated by effective outside length in tenths of an inch (RMA/MPTA IP-22). Nominal sections
  // 3V 3/8 × 5/16 in, 5V 5/8 × 17/32 in, 8V 1 × 7/8 in as tabulated in Machinery's Handbook (narrow V-belt sections);
  // not yet confirmed against an open copy (docs/standards.md). Pitch line at 0.73 of the height, as in the ISO narrow
  // sections below.
  {
    section: "3V",
    family: "narrow",
    unit: "in",
    topWidth: 0.375,
    height: 0.3125,
    pitchOffset: 1.43,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "narrow, 3/8 in top",
  },
  {
    section: "5V",
    family: "narrow",
    unit: "in",
    topWidth: 0.625,
    height: 0.53125,
    pitchOffset: 2.44,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "narrow, 5/8 in top",
  },
  {
    section: "8V",
    family: "narrow",
    unit: "in",
    topWidth: 1.0,
    height: 0.875,
    pitchOffset: 4.01,
    angleDeg: 40,
    designatedBy: "outside",
    designationScale: 10,
    note: "narrow, 1 in top",
  },
  // ISO narrow (wedge) sections, designated by datum length in millimetres (ISO 4184). Datum minus inside length
  // SPZ 37, SPA 45, SPB 60, SPC 83 mm: from memory of makers' conversion tables.
  {
    section: "SPZ",
    family: "iso-narrow",
    unit: "mm",
    topWidth: 9.7,
    height: 8,
    pitchOffset: 37,
    angleDeg: 40,
    designatedBy: "datum",
    designationScale: 1,
    note: "ISO narrow, 9.7 mm top",
  },
  {
    section: "SPA",
    family: "iso-narrow",
    unit: "mm",
    topWidth: 12.7,
    height: 10,
    pitchOffset: 45,
    angleDeg: 40,
    designatedBy: "datum",
    designationScale: 1,
    note: "ISO narrow, 12.7 mm top",
  },
  {
    section: "SPB",
    family: "iso-narrow",
    unit: "mm",
    topWidth: 16.3,
    height: 13,
    pitchOffset: 60,
    angleDeg: 40,
    designatedBy: "datum",
    designationScale: 1,
    note: "ISO narrow, 16.3 mm top",
  },
  {
    section: "SPC",
    family: "iso-narrow",
    unit: "mm",
    topWidth: 22,
    height: 18,
    pitchOffset: 83,
    angleDeg: 40,
    designatedBy: "datum",
    designationScale: 1,
    note: "ISO narrow, 22 mm top",
  },
  // Automotive top widths (SAE J636); heights vary by make, so they are identified by top width alone. From memory.
  ...[0.38, 0.44, 0.5, 0.6875, 0.75, 0.875, 1.0].map((w) => ({
    section: `auto ${inchLabel(w)}`,
    family: "automotive" as const,
    unit: "in" as const,
    topWidth: w,
    height: null,
    pitchOffset: null,
    angleDeg: 36,
    designatedBy: "outside" as const,
    designationScale: 1,
    note: "automotive (fan and generator) belt, 36° section",
  })),
];

/** The R40 series of preferred numbers, ISO 3:1973: standard narrow-belt lengths are chosen from it. */
export const R40 = [
  100, 106, 112, 118, 125, 132, 140, 150, 160, 170, 180, 190, 200, 212, 224, 236, 250, 265, 280, 300, 315, 335, 355,
  375, 400, 425, 450, 475, 500, 530, 560, 600, 630, 670, 710, 750, 800, 850, 900, 950,
];

/**
 * Metric classical sections (ISO 4184; the same belts as DIN 2215), marked by inside (Li), datum (Ld) or outside (La)
 * length in millimetres: `B 1600 Li`. Top width × height in mm; datum = inside + `datumOffset`. Their offsets differ
 * from the inch sections' (only A, 33 mm = 1.3 in, agrees): the datum width is defined differently. Outside = inside +
 * 2π × height, as for every section. Datum offsets not yet confirmed against an open copy (docs/standards.md).
 */
export interface MetricClassicalSection {
  section: string;
  topWidth: number;
  height: number;
  datumOffset: number;
}

export const METRIC_CLASSICAL: MetricClassicalSection[] = [
  { section: "Z", topWidth: 10, height: 6, datumOffset: 22 },
  { section: "A", topWidth: 13, height: 8, datumOffset: 33 },
  { section: "B", topWidth: 17, height: 11, datumOffset: 40 },
  { section: "C", topWidth: 22, height: 14, datumOffset: 58 },
  { section: "D", topWidth: 32, height: 19, datumOffset: 75 },
  { section: "E", topWidth: 38, height: 23, datumOffset: 80 },
];
