import type { z } from "zod";
import { findPartsBySize } from "@/lib/catalogue/find-by-size";
import { matchBearing } from "@/lib/standards/bearings";
import { BELT_MEASURING_NOTES, findSection, identifySection, standardLengthsForPitch } from "@/lib/standards/belts";
import { adjustablePulleyRange, atTradePrecision, solveDrive } from "@/lib/standards/drive";
import { sizeFelt } from "@/lib/standards/felts";
import { sizePacking } from "@/lib/standards/packing";
import { matchPlug } from "@/lib/standards/plugs";
import { measureSeal } from "@/lib/standards/seals";
import { fromMm, toMm, tradeRound } from "@/lib/standards/units";
import {
  beltIdentifyQuery,
  bearingMatchQuery,
  driveQuery,
  feltQuery,
  forField,
  packingQuery,
  plugQuery,
  readOptionalSize,
  readSize,
  readTolerance,
  sealMatchQuery,
} from "@/lib/validation/standards";

/**
 * The calculators' answers: the standards engine's result for what was measured, in the unit it was measured in,
 * and, for bearings and seals, the factory parts of the catalogue whose documented size lies within tolerance.
 */
export async function bearingAnswer(q: z.infer<typeof bearingMatchQuery>) {
  const input = {
    boreMm: readSize("bore", q.bore, q.unit),
    outsideDiameterMm: readSize("od", q.od, q.unit),
    widthMm: readOptionalSize("width", q.width, q.unit),
    toleranceMm: readTolerance(q.tolerance, q.unit),
    unit: q.unit,
  };
  const catalogueParts = await findPartsBySize({
    category: "bearing",
    innerMm: input.boreMm,
    outerMm: input.outsideDiameterMm,
    toleranceMm: input.toleranceMm,
  });
  return { unit: q.unit, ...matchBearing(input), catalogueParts };
}

export async function sealAnswer(q: z.infer<typeof sealMatchQuery>) {
  const shaftMm = readSize("shaft", q.shaft, q.unit);
  const boreMm = readSize("bore", q.bore, q.unit);
  const toleranceMm = readTolerance(q.tolerance, q.unit);
  const result = measureSeal({
    shaftMm,
    boreMm,
    widthMm: readOptionalSize("width", q.width, q.unit),
    toleranceMm,
    unit: q.unit,
    grooved: q.grooved ?? false,
    attributes: { lips: q.lips, spring: q.spring, dustLip: q.dustLip, outside: q.outside },
  });
  const catalogueParts = await findPartsBySize({
    category: "lip_seal",
    innerMm: shaftMm,
    outerMm: boreMm,
    toleranceMm,
  });
  return { unit: q.unit, ...result, catalogueParts };
}

export function beltSectionAnswer(q: z.infer<typeof beltIdentifyQuery>) {
  const candidates = identifySection({
    topWidthMm: readSize("top", q.top, q.unit),
    heightMm: readOptionalSize("height", q.height, q.unit),
    unit: q.unit,
  });
  return { unit: q.unit, candidates, measuringNotes: BELT_MEASURING_NOTES };
}

/** A two-pulley drive worked out in the unit asked for; sizes typed with their own unit are converted first. */
export function driveAnswer(q: z.infer<typeof driveQuery>) {
  const inUnit = (mm: number | undefined) => (mm === undefined ? undefined : fromMm(mm, q.unit));
  const large = inUnit(readSize("large", q.large, q.unit)) as number;
  const small = inUnit(readSize("small", q.small, q.unit)) as number;
  const center = inUnit(readOptionalSize("center", q.center, q.unit));
  const length = inUnit(readOptionalSize("length", q.length, q.unit));
  const field = center !== undefined ? "center" : "length";
  const drive = forField(field, () => solveDrive({ large, small, center, length }));
  const body: Record<string, unknown> = { unit: q.unit, ...atTradePrecision(drive, q.unit) };
  const smallMax = inUnit(readOptionalSize("smallMax", q.smallMax, q.unit));
  if (smallMax !== undefined) {
    const range = forField("smallMax", () =>
      adjustablePulleyRange({ fixed: large, adjustableMin: small, adjustableMax: smallMax, center: drive.center }),
    );
    body.adjustableRange = { shortest: tradeRound(range.shortest, q.unit), longest: tradeRound(range.longest, q.unit) };
  }
  if (q.section) {
    const section = forField("section", () => findSection(q.section as string));
    body.standardLengths = standardLengthsForPitch(section, toMm(drive.pitchLength, q.unit));
  }
  return body;
}

/** Felt ring and strip for a seat, with the catalogue's felt seals of that shaft and seat. */
export async function feltAnswer(q: z.infer<typeof feltQuery>) {
  const shaftMm = readSize("shaft", q.shaft, q.unit);
  const boreMm = readSize("bore", q.bore, q.unit);
  const widthMm = readSize("width", q.width, q.unit);
  const felt = forField("bore", () => sizeFelt({ shaftMm, boreMm, widthMm, unit: q.unit }));
  const catalogueParts = await findPartsBySize({
    category: "felt_seal",
    innerMm: shaftMm,
    outerMm: boreMm,
    toleranceMm: readTolerance(undefined, q.unit) * 3,
  });
  return { ...felt, catalogueParts };
}

/** Gland packing for a stuffing box, with the catalogue's packings of that shaft and box. */
export async function packingAnswer(q: z.infer<typeof packingQuery>) {
  const shaftMm = readSize("shaft", q.shaft, q.unit);
  const boreMm = readSize("bore", q.bore, q.unit);
  const depthMm = readOptionalSize("depth", q.depth, q.unit);
  const field = depthMm !== undefined && boreMm > shaftMm ? "depth" : "bore";
  const packing = forField(field, () => sizePacking({ shaftMm, boreMm, depthMm, unit: q.unit }));
  const catalogueParts = await findPartsBySize({
    category: "packing",
    innerMm: shaftMm,
    outerMm: boreMm,
    toleranceMm: readTolerance(undefined, q.unit) * 3,
  });
  return { ...packing, catalogueParts };
}

/** The cup or disc plug for a measured bore, with the catalogue's plugs of that size. */
export async function plugAnswer(q: z.infer<typeof plugQuery>) {
  const boreMm = readSize("bore", q.bore, q.unit);
  const match = forField("bore", () => matchPlug({ boreMm, unit: q.unit, kind: q.kind }));
  const catalogueParts = await findPartsBySize({
    category: "plug",
    innerMm: null,
    outerMm: boreMm,
    toleranceMm: readTolerance(undefined, q.unit) * 2,
  });
  return { ...match, catalogueParts };
}
