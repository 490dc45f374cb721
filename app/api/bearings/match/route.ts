import { findPartsBySize } from "@/lib/catalogue/find-by-size";
import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { matchBearing } from "@/lib/standards/bearings";
import { bearingMatchQuery, readOptionalSize, readSize, readTolerance } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(bearingMatchQuery, queryOf(request));
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
  return Response.json({ unit: q.unit, ...matchBearing(input), catalogueParts });
});
