import { findPartsBySize } from "@/lib/catalogue/find-by-size";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { measureSeal } from "@/lib/standards/seals";
import { readOptionalSize, readSize, readTolerance, sealMatchQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(sealMatchQuery, queryOf(request));
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
  return Response.json({ unit: q.unit, ...result, catalogueParts });
});
