import { handle } from "@/lib/http/handle";
import { queryOf } from "@/lib/http/query";
import { nearMissFor, nominalCandidates, type Surface } from "@/lib/standards/nominal";
import { nominalQuery, readSize } from "@/lib/validation/standards";
import { parseWith } from "@/lib/validation/parse";

export const runtime = "nodejs";

export const GET = handle(async (request) => {
  const q = parseWith(nominalQuery, queryOf(request));
  const candidates = nominalCandidates(readSize("value", q.value, q.unit), q.unit, q.surface as Surface);
  return Response.json({ unit: q.unit, candidates, nearMiss: nearMissFor(candidates) });
});
