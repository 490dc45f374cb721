import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { checkShaft } from "@/lib/standards/seals";
import { readSize, shaftCheckQuery } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(shaftCheckQuery, queryOf(request));
  return Response.json(
    checkShaft({ shaftMm: readSize("shaft", q.shaft, q.unit), unit: q.unit, grooved: q.grooved ?? false }),
  );
});
