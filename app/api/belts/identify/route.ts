import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { BELT_MEASURING_NOTES, identifySection } from "@/lib/standards/belts";
import { beltIdentifyQuery, readOptionalSize, readSize } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(beltIdentifyQuery, queryOf(request));
  const candidates = identifySection({
    topWidthMm: readSize("top", q.top, q.unit),
    heightMm: readOptionalSize("height", q.height, q.unit),
    unit: q.unit,
  });
  return Response.json({ unit: q.unit, candidates, measuringNotes: BELT_MEASURING_NOTES });
});
