import type { z } from "zod";
import { decodeBearing, matchBearing } from "@/lib/standards/bearings";
import {
  BELT_MEASURING_NOTES,
  decodeBelt,
  findSection,
  identifySection,
  standardLengthsForPitch,
} from "@/lib/standards/belts";
import { adjustablePulleyRange, atTradePrecision, solveDrive } from "@/lib/standards/drive";
import { sizeFelt } from "@/lib/standards/felts";
import { sizePacking } from "@/lib/standards/packing";
import { matchPlug } from "@/lib/standards/plugs";
import { checkPressFit, measureSeal } from "@/lib/standards/seals";
import { fromMm, toMm, tradeRound } from "@/lib/standards/units";
import {
  chainDecodeAnswer,
  chainIdentifyAnswer,
  chainLinksAnswer,
  parallelKeyAnswer,
  taperPinAnswer,
  taperPinMatchAnswer,
  threadAnswer,
  woodruffAnswer,
  woodruffMatchAnswer,
} from "@/lib/measure/small-parts";
import { parseWith } from "@/lib/validation/parse";
import {
  bearingDecodeQuery,
  bearingMatchQuery,
  beltDecodeQuery,
  beltIdentifyQuery,
  chainDecodeQuery,
  chainIdentifyQuery,
  chainLinksQuery,
  driveQuery,
  feltQuery,
  forField,
  packingQuery,
  parallelKeyQuery,
  plugQuery,
  pressFitQuery,
  readOptionalSize,
  readSize,
  readTolerance,
  sealMatchQuery,
  taperPinMatchQuery,
  taperPinQuery,
  threadQuery,
  woodruffMatchQuery,
  woodruffQuery,
} from "@/lib/validation/standards";

/*
 * The calculators as the standards engine works them out, with no database: the API answers with these (adding the
 * catalogue's factory parts of the size where it has them, lib/measure/answers.ts), and the browser runs the very
 * same functions when there is no connection (lib/hooks/use-calculators.ts). Nothing here may import the database.
 */

export function bearingResult(q: z.infer<typeof bearingMatchQuery>) {
  const input = {
    boreMm: readSize("bore", q.bore, q.unit),
    outsideDiameterMm: readSize("od", q.od, q.unit),
    widthMm: readOptionalSize("width", q.width, q.unit),
    toleranceMm: readTolerance(q.tolerance, q.unit),
    unit: q.unit,
  };
  return { unit: q.unit, ...matchBearing(input) };
}

export function sealResult(q: z.infer<typeof sealMatchQuery>) {
  const result = measureSeal({
    shaftMm: readSize("shaft", q.shaft, q.unit),
    boreMm: readSize("bore", q.bore, q.unit),
    widthMm: readOptionalSize("width", q.width, q.unit),
    toleranceMm: readTolerance(q.tolerance, q.unit),
    unit: q.unit,
    grooved: q.grooved ?? false,
    attributes: { lips: q.lips, spring: q.spring, dustLip: q.dustLip, outside: q.outside },
  });
  return { unit: q.unit, ...result };
}

export function pressFitResult(q: z.infer<typeof pressFitQuery>) {
  return checkPressFit({
    boreMm: readSize("bore", q.bore, q.unit),
    sealOdMm: readSize("sealOd", q.sealOd, q.unit),
    outside: q.outside,
    unit: q.unit,
  });
}

export function beltSectionResult(q: z.infer<typeof beltIdentifyQuery>) {
  const candidates = identifySection({
    topWidthMm: readSize("top", q.top, q.unit),
    heightMm: readOptionalSize("height", q.height, q.unit),
    unit: q.unit,
  });
  return { unit: q.unit, candidates, measuringNotes: BELT_MEASURING_NOTES };
}

/** A two-pulley drive worked out in the unit asked for; sizes typed with their own unit are converted first. */
export function driveResult(q: z.infer<typeof driveQuery>) {
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

/** Felt ring and strip for a seat. */
export function feltResult(q: z.infer<typeof feltQuery>) {
  const shaftMm = readSize("shaft", q.shaft, q.unit);
  const boreMm = readSize("bore", q.bore, q.unit);
  const widthMm = readSize("width", q.width, q.unit);
  return forField("bore", () => sizeFelt({ shaftMm, boreMm, widthMm, unit: q.unit }));
}

/** Gland packing for a stuffing box. */
export function packingResult(q: z.infer<typeof packingQuery>) {
  const shaftMm = readSize("shaft", q.shaft, q.unit);
  const boreMm = readSize("bore", q.bore, q.unit);
  const depthMm = readOptionalSize("depth", q.depth, q.unit);
  const field = depthMm !== undefined && boreMm > shaftMm ? "depth" : "bore";
  return forField(field, () => sizePacking({ shaftMm, boreMm, depthMm, unit: q.unit }));
}

/** The cup or disc plug for a measured bore. */
export function plugResult(q: z.infer<typeof plugQuery>) {
  const boreMm = readSize("bore", q.bore, q.unit);
  return forField("bore", () => matchPlug({ boreMm, unit: q.unit, kind: q.kind }));
}

interface Calculator<S extends z.ZodType> {
  query: S;
  workOut: (q: z.infer<S>) => unknown;
}
const calculator = <S extends z.ZodType>(query: S, workOut: (q: z.infer<S>) => unknown): Calculator<S> => ({
  query,
  workOut,
});

/** Every calculator address of the API, with its query and the engine's answer. */
export const CALCULATORS: Record<string, Calculator<z.ZodType>> = {
  "/api/bearings/decode": calculator(bearingDecodeQuery, (q) =>
    forField("designation", () => decodeBearing(q.designation)),
  ),
  "/api/bearings/match": calculator(bearingMatchQuery, bearingResult),
  "/api/seals/match": calculator(sealMatchQuery, sealResult),
  "/api/seals/press-fit": calculator(pressFitQuery, pressFitResult),
  "/api/belts/decode": calculator(beltDecodeQuery, (q) => forField("designation", () => decodeBelt(q.designation))),
  "/api/belts/identify": calculator(beltIdentifyQuery, beltSectionResult),
  "/api/belts/drive": calculator(driveQuery, driveResult),
  "/api/felts/size": calculator(feltQuery, feltResult),
  "/api/packing/size": calculator(packingQuery, packingResult),
  "/api/plugs/match": calculator(plugQuery, plugResult),
  "/api/keys/woodruff": calculator(woodruffQuery, woodruffAnswer),
  "/api/keys/woodruff/match": calculator(woodruffMatchQuery, woodruffMatchAnswer),
  "/api/keys/parallel": calculator(parallelKeyQuery, parallelKeyAnswer),
  "/api/pins/taper": calculator(taperPinQuery, taperPinAnswer),
  "/api/pins/taper/match": calculator(taperPinMatchQuery, taperPinMatchAnswer),
  "/api/threads/identify": calculator(threadQuery, threadAnswer),
  "/api/chain/decode": calculator(chainDecodeQuery, chainDecodeAnswer),
  "/api/chain/identify": calculator(chainIdentifyQuery, chainIdentifyAnswer),
  "/api/chain/links": calculator(chainLinksQuery, chainLinksAnswer),
};

/** The engine's answer for a calculator address and its query, as the API gives it; a bad query throws its 400. */
export function workOut(path: string, query: Record<string, string>): unknown {
  const found = CALCULATORS[path];
  if (!found) throw new Error(`No calculator answers at ${path}.`);
  return found.workOut(parseWith(found.query, query));
}
