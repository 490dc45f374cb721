import type { z } from "zod";
import { findPartsBySize } from "@/lib/catalogue/find-by-size";
import { bearingResult, feltResult, packingResult, plugResult, sealResult } from "@/lib/measure/calculators";
import {
  bearingMatchQuery,
  feltQuery,
  packingQuery,
  plugQuery,
  readSize,
  readTolerance,
  sealMatchQuery,
} from "@/lib/validation/standards";

/**
 * The calculators' answers that add the catalogue: the engine's result (lib/measure/calculators.ts, which the
 * browser also runs offline) and the factory parts whose documented size lies within tolerance of what was measured.
 */
export async function bearingAnswer(q: z.infer<typeof bearingMatchQuery>) {
  const result = bearingResult(q);
  const catalogueParts = await findPartsBySize({
    category: "bearing",
    innerMm: readSize("bore", q.bore, q.unit),
    outerMm: readSize("od", q.od, q.unit),
    toleranceMm: readTolerance(q.tolerance, q.unit),
  });
  return { ...result, catalogueParts };
}

export async function sealAnswer(q: z.infer<typeof sealMatchQuery>) {
  const result = sealResult(q);
  const catalogueParts = await findPartsBySize({
    category: "lip_seal",
    innerMm: readSize("shaft", q.shaft, q.unit),
    outerMm: readSize("bore", q.bore, q.unit),
    toleranceMm: readTolerance(q.tolerance, q.unit),
  });
  return { ...result, catalogueParts };
}

/** Felt ring and strip for a seat, with the catalogue's felt seals of that shaft and seat. */
export async function feltAnswer(q: z.infer<typeof feltQuery>) {
  const felt = feltResult(q);
  const catalogueParts = await findPartsBySize({
    category: "felt_seal",
    innerMm: readSize("shaft", q.shaft, q.unit),
    outerMm: readSize("bore", q.bore, q.unit),
    toleranceMm: readTolerance(undefined, q.unit) * 3,
  });
  return { ...felt, catalogueParts };
}

/** Gland packing for a stuffing box, with the catalogue's packings of that shaft and box. */
export async function packingAnswer(q: z.infer<typeof packingQuery>) {
  const packing = packingResult(q);
  const catalogueParts = await findPartsBySize({
    category: "packing",
    innerMm: readSize("shaft", q.shaft, q.unit),
    outerMm: readSize("bore", q.bore, q.unit),
    toleranceMm: readTolerance(undefined, q.unit) * 3,
  });
  return { ...packing, catalogueParts };
}

/** The cup or disc plug for a measured bore, with the catalogue's plugs of that size. */
export async function plugAnswer(q: z.infer<typeof plugQuery>) {
  const match = plugResult(q);
  const catalogueParts = await findPartsBySize({
    category: "plug",
    innerMm: null,
    outerMm: readSize("bore", q.bore, q.unit),
    toleranceMm: readTolerance(undefined, q.unit) * 2,
  });
  return { ...match, catalogueParts };
}
