import type { z } from "zod";
import { chainLinks, decodeChain, identifyChain } from "@/lib/standards/chain";
import { decodeWoodruff, matchWoodruff, parallelKeys } from "@/lib/standards/keys";
import { decodeTaperPin, matchTaperPin, PIN_NOTES } from "@/lib/standards/pins";
import { GREASE_FITTINGS, identifyThread, pitchFrom } from "@/lib/standards/threads";
import { fromMm, toMm, type LengthUnit } from "@/lib/standards/units";
import {
  chainDecodeQuery,
  chainIdentifyQuery,
  chainLinksQuery,
  forField,
  parallelKeyQuery,
  readOptionalSize,
  readSize,
  taperPinMatchQuery,
  taperPinQuery,
  threadQuery,
  woodruffMatchQuery,
  woodruffQuery,
} from "@/lib/validation/standards";

/** The small parts' answers: keys, taper pins, threads and roller chain, from the standards engine. */

export const woodruffAnswer = (q: z.infer<typeof woodruffQuery>) => forField("number", () => decodeWoodruff(q.number));

export function woodruffMatchAnswer(q: z.infer<typeof woodruffMatchQuery>) {
  const candidates = matchWoodruff({
    widthMm: readSize("width", q.width, q.unit),
    diameterMm: readSize("diameter", q.diameter, q.unit),
    heightMm: readOptionalSize("height", q.height, q.unit),
    unit: q.unit,
  });
  return { unit: q.unit, candidates };
}

export const parallelKeyAnswer = (q: z.infer<typeof parallelKeyQuery>) =>
  forField("shaft", () => parallelKeys(readSize("shaft", q.shaft, q.unit), q.unit));

export function taperPinAnswer(q: z.infer<typeof taperPinQuery>) {
  const lengthMm = readOptionalSize("length", q.length, q.unit);
  return { ...forField("number", () => decodeTaperPin(q.number, lengthMm)), notes: PIN_NOTES };
}

export function taperPinMatchAnswer(q: z.infer<typeof taperPinMatchQuery>) {
  const candidates = matchTaperPin({
    largeEndMm: readSize("largeEnd", q.largeEnd, q.unit),
    lengthMm: readOptionalSize("length", q.length, q.unit),
    unit: q.unit,
  });
  return { unit: q.unit, candidates, notes: PIN_NOTES };
}

export function threadAnswer(q: z.infer<typeof threadQuery>) {
  const diameterMm = readSize("diameter", q.diameter, q.unit);
  const pitchMm = forField(q.tpi !== undefined ? "tpi" : "pitch", () =>
    pitchFrom({ tpi: q.tpi, pitchMm: q.pitch === undefined ? undefined : readSize("pitch", q.pitch, "mm") }),
  );
  const candidates = forField("diameter", () => identifyThread({ diameterMm, pitchMm, unit: q.unit }));
  return { unit: q.unit, candidates, greaseFittings: GREASE_FITTINGS };
}

export const chainDecodeAnswer = (q: z.infer<typeof chainDecodeQuery>) =>
  forField("number", () => decodeChain(q.number));

export function chainIdentifyAnswer(q: z.infer<typeof chainIdentifyQuery>) {
  const candidates = identifyChain({
    pitchMm: readSize("pitch", q.pitch, q.unit),
    rollerMm: readSize("roller", q.roller, q.unit),
    innerWidthMm: readOptionalSize("width", q.width, q.unit),
    unit: q.unit,
  });
  return { unit: q.unit, candidates };
}

/** Links for a drive; the pitch from the chain's number, or as measured, in the unit of the centre distance. */
export function chainLinksAnswer(q: z.infer<typeof chainLinksQuery>) {
  const unit: LengthUnit = q.unit;
  const pitch = q.number
    ? forField("number", () => {
        const chain = decodeChain(q.number as string);
        return fromMm(toMm(chain.pitch, chain.unit), unit);
      })
    : fromMm(readSize("pitch", q.pitch as string, unit), unit);
  const center = fromMm(readSize("center", q.center, unit), unit);
  return forField("center", () => chainLinks({ pitch, teeth1: q.teeth1, teeth2: q.teeth2, center, unit }));
}
